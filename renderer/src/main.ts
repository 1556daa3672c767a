import 'katex/dist/katex.min.css';
import './styles.css';
import { createPinia } from 'pinia';
import { createApp } from 'vue';
import App from './App.vue';
import { detectPlatform } from './platform/platform.ts';
import { setJobRunnerFactory } from './stores/jobs.ts';
import { workerRunner } from './worker/worker-runner.ts';

if (typeof Worker !== 'undefined') setJobRunnerFactory(workerRunner);
createApp(App, { platform: detectPlatform() }).use(createPinia()).mount('#app');

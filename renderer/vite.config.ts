// Vite configuration of the renderer, shared by `npm run build:renderer`, `npm start`'s
// browser fallback, the end-to-end tests and electron-vite's renderer build.
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';

const root = fileURLToPath(new URL('.', import.meta.url));
export const rendererOutDir = fileURLToPath(new URL('../out/renderer', import.meta.url));

export default defineConfig({
  root,
  base: './',
  plugins: [vue()],
  worker: { format: 'es' },
  build: { outDir: rendererOutDir, emptyOutDir: true, target: 'es2022', chunkSizeWarningLimit: 2000 },
  server: { host: '127.0.0.1', fs: { allow: [fileURLToPath(new URL('..', import.meta.url))] } },
  preview: { host: '127.0.0.1' },
});

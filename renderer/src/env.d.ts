/// <reference types="vite/client" />
import type { CoppiceBridge } from '../../src/core/project/ipc-contract.ts';

declare global {
  interface Window {
    /** Present only inside the desktop app (put there by the preload). */
    coppice?: CoppiceBridge;
  }
}

declare module '*.vue' {
  import type { DefineComponent } from 'vue';
  const component: DefineComponent<object, object, unknown>;
  export default component;
}

// electron-vite builds the three parts into out/: main (ESM), preload (CommonJS, so the
// sandbox stays on) and the renderer (the same Vite config as the browser build).
import { defineConfig } from 'electron-vite';
import renderer from './renderer/vite.config.ts';

export default defineConfig({
  main: {
    build: { outDir: 'out/main', rollupOptions: { input: { index: 'src/main/index.ts' } } },
  },
  preload: {
    build: {
      outDir: 'out/preload',
      rollupOptions: { input: { preload: 'src/main/preload.ts' }, output: { format: 'cjs', entryFileNames: '[name].cjs' } },
    },
  },
  renderer: {
    ...renderer,
    build: { ...renderer.build, rollupOptions: { input: 'renderer/index.html' } },
  },
});

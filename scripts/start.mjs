// `npm start`: the desktop app on the demo project when Electron's binary is installed;
// otherwise (headless build machines) build the same renderer and serve it on 127.0.0.1,
// print the address, and keep serving until interrupted.
import { spawn } from 'node:child_process';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const require = createRequire(import.meta.url);
process.env.ELECTRON_SKIP_BINARY_DOWNLOAD ??= '1';

function electronBinary() {
  try {
    // With the binary present this is its path; without it, electron's index throws.
    const p = require('electron');
    return typeof p === 'string' ? p : null;
  } catch {
    return null;
  }
}

const run = (cmd, args) =>
  new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd: root, stdio: 'inherit' });
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`${cmd} ${args.join(' ')} exited with ${code}`))));
  });

const electron = electronBinary();
if (electron && !process.argv.includes('--browser')) {
  await run(process.execPath, [require.resolve('electron-vite/bin/electron-vite.js'), 'build']);
  const child = spawn(electron, ['.', '--project', 'assets/demo/phi4-course.coppice.json'], { cwd: root, stdio: 'inherit' });
  child.on('exit', (code) => process.exit(code ?? 0));
} else {
  const { build, preview } = await import('vite');
  const configFile = fileURLToPath(new URL('../renderer/vite.config.ts', import.meta.url));
  console.log(electron ? 'coppice: serving the app in the browser (--browser)' : 'coppice: Electron is not installed here, so the app is served for a browser instead');
  await build({ configFile, logLevel: 'warn' });
  const port = Number(process.env.PORT) || 4317;
  const server = await preview({ configFile, preview: { host: '127.0.0.1', port, strictPort: false, open: false } });
  const address = server.httpServer.address();
  console.log(`coppice: open http://127.0.0.1:${address.port}/ (the demo project loads; Ctrl+C stops)`);
  const stop = () => server.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

// Starts the built desktop app. When Electron's binary is missing (its download at
// `npm install` was skipped or impossible) it tries that download once; when Electron
// still cannot run, it serves the same built UI in the browser instead, so `npm start`
// always ends in a working app with the demo document loaded.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const require = createRequire(import.meta.url);

/** The Electron executable if it is installed; never triggers a download itself. */
function electronBinary() {
  let packageDir;
  try {
    packageDir = dirname(require.resolve('electron/package.json'));
  } catch {
    return null;
  }
  const pathFile = join(packageDir, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const binary = join(packageDir, 'dist', readFileSync(pathFile, 'utf8').trim());
  return existsSync(binary) ? { binary, packageDir } : null;
}

/** Runs Electron's own installer once; true when a binary is there afterwards. */
function tryInstallElectron() {
  let installer;
  try {
    installer = join(dirname(require.resolve('electron/package.json')), 'install.js');
  } catch {
    return false;
  }
  console.log('Electron\'s binary is missing; fetching it once (node node_modules/electron/install.js) ...');
  const result = spawnSync(process.execPath, [installer], { stdio: 'inherit', timeout: 120_000 });
  return result.status === 0 && electronBinary() !== null;
}

/** Why a desktop window cannot be shown here, or null when nothing is known to stop it. */
function noDisplayReason() {
  if (process.platform !== 'linux') return null;
  if (process.env.DISPLAY || process.env.WAYLAND_DISPLAY) return null;
  return 'this Linux session has no graphical display (neither DISPLAY nor WAYLAND_DISPLAY is set)';
}

/** Stops `child` when this launcher is told to stop, so no server is left behind. */
function forwardStops(child) {
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(signal, () => child.kill(signal));
}

function serveInBrowser(reason) {
  console.log(
    `\nPassline cannot open its desktop window: ${reason}. ` +
    'It runs in your web browser instead, with the demo document loaded: the same built app is served ' +
    'on this computer only (127.0.0.1). There, Open… uses the browser\'s file picker, and Save as… ' +
    'downloads the file or, in browsers that allow it, asks where to save it. For the desktop app, let ' +
    'Electron fetch its binary (an internet connection, or ELECTRON_MIRROR set to a reachable mirror) ' +
    'and run `npm start` again. Press Ctrl+C to stop the server.\n',
  );
  const vite = join(dirname(require.resolve('vite/package.json')), 'bin', 'vite.js');
  const server = spawn(process.execPath, [vite, 'preview', '--host', '127.0.0.1', '--port', '4173'], { cwd: root, stdio: 'inherit' });
  forwardStops(server);
  server.on('exit', (code) => process.exit(code ?? 0));
  console.log('Open the address the server prints below (normally http://127.0.0.1:4173/) in your browser.\n');
}

function start() {
  const skipInstall = process.env.PASSLINE_SKIP_ELECTRON_INSTALL === '1';
  const found = electronBinary() ?? (!skipInstall && tryInstallElectron() ? electronBinary() : null);
  if (!found) {
    return serveInBrowser(skipInstall
      ? 'Electron\'s binary is not installed (its download was skipped because PASSLINE_SKIP_ELECTRON_INSTALL=1)'
      : 'Electron\'s binary is not installed and could not be downloaded');
  }
  const display = noDisplayReason();
  if (display) return serveInBrowser(display);
  const startedAt = Date.now();
  const child = spawn(found.binary, [root], { stdio: 'inherit' });
  forwardStops(child);
  child.on('error', (error) => serveInBrowser(`Electron did not start (${error.message})`));
  child.on('exit', (code, signal) => {
    // A crash within seconds is a missing system library or similar, not the user quitting.
    if (code !== 0 && !signal && Date.now() - startedAt < 5000) return serveInBrowser(`Electron stopped at once (exit code ${code})`);
    process.exit(signal ? 1 : (code ?? 0));
  });
}

start();

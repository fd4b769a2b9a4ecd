import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

const require = createRequire(import.meta.url);

/**
 * The installed Electron executable, or why the desktop suite cannot run here. Looks the
 * binary up the way Electron's own package records it (path.txt) without loading the
 * package, which throws when the binary's download was skipped.
 */
export function electronBinary(): { binary: string } | { reason: string } {
  let packageDir: string;
  try {
    packageDir = dirname(require.resolve('electron/package.json'));
  } catch {
    return { reason: 'the electron package is not installed' };
  }
  const pathFile = join(packageDir, 'path.txt');
  if (!existsSync(pathFile)) return { reason: `Electron's binary was never downloaded (${pathFile} is missing; run \`node node_modules/electron/install.js\` with internet access)` };
  const binary = join(packageDir, 'dist', readFileSync(pathFile, 'utf8').trim());
  if (!existsSync(binary)) return { reason: `Electron's binary is missing (${binary})` };
  if (process.platform === 'linux' && !process.env.DISPLAY && !process.env.WAYLAND_DISPLAY) {
    return { reason: 'this Linux session has no display (set DISPLAY, e.g. run under xvfb-run)' };
  }
  return { binary };
}

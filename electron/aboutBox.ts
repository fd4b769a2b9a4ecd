import type { MessageBoxOptions } from 'electron';

/** The About box: what the app is, its version, and the caution its results carry. */
export function aboutMessage(appName: string, version: string, versions: { electron?: string; chrome?: string; node?: string }): MessageBoxOptions {
  return {
    type: 'info',
    title: `About ${appName}`,
    message: `${appName} ${version}`,
    detail: [
      'Reaction-coordinate energy profiles: make them consistent, analyse them, draw them.',
      'Energies and rates shown here are not a process-safety assessment; for scale-up, confirm by calorimetry and follow local codes and licensed practice.',
      `Electron ${versions.electron ?? '?'} · Chromium ${versions.chrome ?? '?'} · Node ${versions.node ?? '?'}`,
    ].join('\n\n'),
    buttons: ['OK'],
    noLink: true,
  };
}

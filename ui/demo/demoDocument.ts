import { parseDocument, type LoadResult } from '../../core/model/load.ts';
import demoText from '../../assets/demo/demo.passline?raw';

/** File name the demo is shown under and suggested when it is first saved. */
export const DEMO_FILE_NAME = 'demo.passline';

/** The demo document bundled with the app, parsed like any file the user opens. */
export function loadDemo(): LoadResult {
  return parseDocument(demoText);
}

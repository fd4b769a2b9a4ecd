import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const require = createRequire(import.meta.url);
// Both come with electron-builder (a pinned devDependency): its YAML reader and its schema checker.
const yaml = require('js-yaml') as { load(text: string): unknown };
const Ajv = require('ajv') as new (options: object) => { compile(schema: object): ((data: unknown) => boolean) & { errors?: unknown } };

const config = yaml.load(readFileSync(`${root}electron-builder.yml`, 'utf8')) as Record<string, any>;

/** Width and height from a PNG's IHDR chunk (PNG specification, W3C 2003, §11.2.2). */
function pngSize(path: string): [number, number] {
  const bytes = readFileSync(path);
  expect([...bytes.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  return [bytes.readUInt32BE(16), bytes.readUInt32BE(20)];
}

describe('electron-builder.yml', () => {
  it('is valid against electron-builder\'s own configuration schema', () => {
    const schema = JSON.parse(readFileSync(require.resolve('app-builder-lib/scheme.json'), 'utf8')) as object;
    const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);
    expect(validate(config), JSON.stringify(validate.errors)).toBe(true);
  });

  it('names the app, associates .passline files and builds the required targets', () => {
    expect(config).toMatchObject({ appId: 'org.passline.desktop', productName: 'Passline' });
    expect(config.fileAssociations).toEqual([expect.objectContaining({ ext: 'passline' })]);
    expect(config.linux.target).toEqual(['AppImage', 'deb']);
    expect([config.win.target, config.mac.target]).toEqual(['nsis', 'dmg']);
  });

  it('packs the built renderer, the bundled main process and package.json, which points at it', () => {
    expect(config.files).toEqual(expect.arrayContaining(['dist/renderer/**/*', 'electron/dist/**/*', 'package.json']));
    expect(JSON.parse(readFileSync(`${root}package.json`, 'utf8')).main).toBe('electron/dist/main.js');
  });

  it('has every icon it names, at the size its file name says', () => {
    // electron-builder: at least 512 px for macOS and 256 px for Windows (electron.build "Icons").
    expect(pngSize(`${root}${config.mac.icon}`)).toEqual([512, 512]);
    expect(pngSize(`${root}${config.win.icon}`)[0]).toBeGreaterThanOrEqual(256);
    for (const size of [16, 24, 32, 48, 64, 128, 256, 512]) expect(pngSize(`${root}${config.linux.icon}/${size}x${size}.png`)).toEqual([size, size]);
  });
});

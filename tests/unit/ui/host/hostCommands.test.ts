import { afterEach, describe, expect, it, vi } from 'vitest';
import { onHostCommand } from '../../../../ui/host/hostCommands.ts';
import { COMMANDS_GLOBAL, type CommandSource } from '../../../../ui/host/hostApi.ts';

afterEach(() => {
  delete (window as unknown as Record<string, unknown>)[COMMANDS_GLOBAL];
  document.body.innerHTML = '';
});

/** A command source like preload's, driven by the test. */
function exposeSource() {
  let emit: (value: unknown) => void = () => undefined;
  const source: CommandSource = { subscribe: (listener) => ((emit = listener), () => void (emit = () => undefined)) };
  (window as unknown as Record<string, unknown>)[COMMANDS_GLOBAL] = source;
  return { emit: (value: unknown) => emit(value) };
}

describe('onHostCommand on the desktop', () => {
  it('passes on well-formed commands from the menus and stops when told', () => {
    const { emit } = exposeSource();
    const seen: unknown[] = [];
    const stop = onHostCommand((command) => seen.push(command));
    emit({ kind: 'export', format: 'svg' });
    emit({ kind: 'format-disk' });
    stop();
    emit({ kind: 'save' });
    expect(seen).toEqual([{ kind: 'export', format: 'svg' }]);
  });

  it('gives the menu\'s undo to a focused text field instead of the document', () => {
    const { emit } = exposeSource();
    const input = document.createElement('input');
    document.body.append(input);
    input.focus();
    const execCommand = vi.fn(() => true);
    Object.defineProperty(document, 'execCommand', { value: execCommand, configurable: true });
    const seen: unknown[] = [];
    onHostCommand((command) => seen.push(command));
    emit({ kind: 'undo' });
    expect(execCommand).toHaveBeenCalledWith('undo');
    expect(seen).toEqual([]);
    input.blur();
    emit({ kind: 'undo' });
    expect(seen).toEqual([{ kind: 'undo' }]);
  });
});

describe('onHostCommand in a browser', () => {
  it('turns the same shortcuts into commands and keeps the browser from acting on them', () => {
    const seen: unknown[] = [];
    const stop = onHostCommand((command) => seen.push(command));
    const event = new KeyboardEvent('keydown', { key: 's', ctrlKey: true, cancelable: true });
    window.dispatchEvent(event);
    // jsdom reports an empty navigator.platform, so Ctrl is the command key here.
    expect(seen).toEqual([{ kind: 'save' }]);
    expect(event.defaultPrevented).toBe(true);
    stop();
    window.dispatchEvent(new KeyboardEvent('keydown', { key: 's', ctrlKey: true }));
    expect(seen).toHaveLength(1);
  });

  it('leaves Ctrl+Z in a text field to the field', () => {
    const seen: unknown[] = [];
    onHostCommand((command) => seen.push(command));
    const input = document.createElement('textarea');
    document.body.append(input);
    input.dispatchEvent(new KeyboardEvent('keydown', { key: 'z', ctrlKey: true, bubbles: true }));
    window.dispatchEvent(new KeyboardEvent('keydown', { key: 'z', ctrlKey: true }));
    expect(seen).toEqual([{ kind: 'undo' }]);
  });
});

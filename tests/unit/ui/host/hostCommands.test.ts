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

  it('sends the menu\'s undo to the document even from a focused text field, which commits first', () => {
    const { emit } = exposeSource();
    const input = document.createElement('input');
    document.body.append(input);
    input.focus();
    const seen: unknown[] = [];
    onHostCommand((command) => seen.push([command, document.activeElement === input]));
    emit({ kind: 'undo' });
    expect(seen).toEqual([[{ kind: 'undo' }, false]]);
  });

  it('keeps a field\'s own text undo from running, without a second document undo', () => {
    exposeSource();
    const seen: unknown[] = [];
    onHostCommand((command) => seen.push(command));
    const event = new InputEvent('beforeinput', { inputType: 'historyUndo', cancelable: true, bubbles: true });
    document.body.dispatchEvent(event);
    expect(event.defaultPrevented).toBe(true);
    expect(seen).toEqual([]);
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

  it('gives Ctrl+Z in a text field to the document, not to the field', () => {
    const seen: unknown[] = [];
    onHostCommand((command) => seen.push(command));
    const input = document.createElement('textarea');
    document.body.append(input);
    input.focus();
    const event = new KeyboardEvent('keydown', { key: 'z', ctrlKey: true, bubbles: true, cancelable: true });
    input.dispatchEvent(event);
    expect(event.defaultPrevented).toBe(true);
    expect(document.activeElement).not.toBe(input);
    expect(seen).toEqual([{ kind: 'undo' }]);
  });

  it('turns a text field\'s own undo (context menu) into the document\'s', () => {
    const seen: unknown[] = [];
    onHostCommand((command) => seen.push(command));
    const event = new InputEvent('beforeinput', { inputType: 'historyRedo', cancelable: true, bubbles: true });
    document.body.dispatchEvent(event);
    expect(event.defaultPrevented).toBe(true);
    expect(seen).toEqual([{ kind: 'redo' }]);
  });
});

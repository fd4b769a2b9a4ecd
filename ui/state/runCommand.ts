import { makeDocument } from '../../core/model/load.ts';
import { deletePoint } from '../../core/edit/pointEdits.ts';
import type { DocumentStore } from './documentStore.svelte.ts';
import type { Command } from './shortcuts.ts';

/** A fresh document: one empty pathway to start typing into. */
function blankDocument() {
  return makeDocument({ title: '', pathways: [{ id: 'pathway-1', name: 'Pathway 1', points: [] }] });
}

let discardArmed = false;

/**
 * Carries out an editor command. "New" with unsaved changes asks for a second press
 * instead of a dialog, so nothing is lost by one stray click.
 */
export function runCommand(store: DocumentStore, command: Command, openExport: () => void): void {
  if (command !== 'new') discardArmed = false;
  switch (command) {
    case 'undo': return store.undo();
    case 'redo': return store.redo();
    case 'save': return void store.save();
    case 'saveAs': return void store.saveAs();
    case 'open': return void store.open();
    case 'export': return openExport();
    case 'delete': {
      const s = store.selection;
      if (s && store.apply(deletePoint(store.doc, s))) { store.selection = null; store.status = 'Point deleted (Undo brings it back).'; }
      return;
    }
    case 'new':
      if (store.dirty && !discardArmed) {
        discardArmed = true;
        store.status = 'This document has unsaved changes: press New again to discard them, or save first.';
        return;
      }
      discardArmed = false;
      store.replace(blankDocument(), 'untitled.passline');
      store.status = 'New document.';
  }
}

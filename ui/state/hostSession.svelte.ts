import { serializeDocument } from '../../core/model/load.ts';
import type { HostApi, RecentFile, RecoveryOffer } from '../host/hostApi.ts';
import { createAutosaveScheduler } from '../host/autosaveScheduler.ts';
import { onHostCommand } from '../host/hostCommands.ts';
import type { HostCommand } from '../host/hostCommand.ts';
import type { ExportKind } from '../export/buildExport.ts';
import type { DocumentStore } from './documentStore.svelte.ts';
import { runCommand } from './runCommand.ts';
import { userMessage } from './userMessage.ts';

const EXPORT_KINDS: Record<Extract<HostCommand, { kind: 'export' }>['format'], ExportKind> = {
  svg: 'svg', pdf: 'pdf', png: 'png', csv: 'points-csv', markdown: 'points-md',
};

/**
 * What the editor does with its host beyond files: menu and shortcut commands, the
 * recent list, the crash-safe working copy and its recovery, and the close question.
 */
export class HostSession {
  recent: RecentFile[] = $state.raw([]);
  recovery: RecoveryOffer | null = $state.raw(null);
  readonly #store: DocumentStore;
  readonly #host: HostApi;
  readonly #openExport: (kind?: ExportKind) => void;
  readonly #autosave;
  #wasDirty = false;

  constructor(store: DocumentStore, host: HostApi, openExport: (kind?: ExportKind) => void) {
    this.#store = store;
    this.#host = host;
    this.#openExport = openExport;
    this.#autosave = createAutosaveScheduler((s) => host.autosave(s), (error) => { store.status = `Could not keep a working copy: ${userMessage(error)}`; });
  }

  /** Starts listening for host commands and looks for recent files and a copy to recover; returns the stop function. */
  start(): () => void {
    const stop = onHostCommand((command) => void this.handle(command));
    void this.refreshRecent();
    this.#host.recoveryOffer().then((offer) => { this.recovery = offer; }, () => {});
    return () => { stop(); this.#autosave.dispose(); };
  }

  /** Keeps the working copy in step with the document (call whenever it or its dirtiness changes). */
  track(): void {
    const store = this.#store;
    if (store.dirty) {
      this.#wasDirty = true;
      const doc = store.doc, name = store.fileName, path = store.filePath;
      this.#autosave.changed(() => ({ name, text: serializeDocument(doc), ...(path ? { path } : {}) }));
    } else if (this.#wasDirty) {
      this.#wasDirty = false;
      void this.#autosave.clean();
    }
  }

  async refreshRecent(): Promise<void> {
    try { this.recent = await this.#host.recentFiles(); } catch { this.recent = []; }
  }

  /** Brings back the working copy of a session that ended without closing; it stays unsaved. */
  async restore(): Promise<void> {
    const offer = this.recovery;
    if (!offer) return;
    this.recovery = null;
    if (this.#store.openText(offer.name, offer.text, offer.path)) {
      this.#store.replace(this.#store.doc, offer.name, offer.path, true);
      this.#store.status = `Restored the unsaved copy of ${offer.name} from ${offer.savedAt}.`;
    }
    await this.#host.dismissRecovery();
  }

  async declineRecovery(): Promise<void> {
    this.recovery = null;
    await this.#host.dismissRecovery();
  }

  /** Carries out a command from the host's menus or shortcuts. */
  async handle(command: HostCommand): Promise<void> {
    const store = this.#store;
    switch (command.kind) {
      case 'export': return this.#openExport(EXPORT_KINDS[command.format]);
      case 'openKnown': await store.openKnown(command.path); return this.refreshRecent();
      case 'closeRequested': return this.#host.replyClose({ dirty: store.dirty, name: store.fileName });
      case 'saveThenClose':
        if (await store.save()) await this.#host.replyClose({ dirty: false, name: store.fileName });
        return;
      case 'open': await store.open(); return this.refreshRecent();
      case 'save': case 'saveAs': await (command.kind === 'save' ? store.save() : store.saveAs()); return this.refreshRecent();
      default: return runCommand(store, command.kind, () => this.#openExport());
    }
  }
}

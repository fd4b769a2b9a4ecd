import { parseDocument, serializeDocument, type DocumentError } from '../../core/model/load.ts';
import type { Document } from '../../core/model/schema.ts';
import { analyseDocument, analyseResolved, type DocumentAnalysis } from '../../core/analysis/analyseDocument.ts';
import { resolveProfile } from '../../core/profile/resolve.ts';
import { markUnresolved } from '../../core/profile/checks/unresolvedInputs.ts';
import { activeInputs, withInput, withoutInput, type HeldInput, type InputPlace } from './heldInputs.ts';
import type { ResolvedProfile } from '../../core/profile/types.ts';
import { pointDepictions, type PointDrawing } from '../../core/structure/pointDepictions.ts';
import { hasStructures, readStructures, type StructureTable } from '../../core/structure/readStructures.ts';
import type { StructureToolkit } from '../../core/structure/structureToolkit.ts';
import { referenceFallback } from '../../core/edit/referenceEdits.ts';
import { closeGroup, record, redo, startHistory, undo, type History, type RecordOptions } from '../../core/edit/history.ts';
import { DOCUMENT_EXTENSION, type ExportRequest, type HostApi } from '../host/hostApi.ts';
import { suggestFileName } from './suggestFileName.ts';
import { userMessage } from './userMessage.ts';

/** Why the last open failed, for the alert region. */
export interface OpenProblem {
  fileName: string;
  errors: DocumentError[];
}

/** The point the user has selected (in the canvas, the mechanism panel or a finding). */
export interface Selection {
  pathway: string;
  point: string;
}

/**
 * The open document, its undo history and what the shell shows about it. The document is
 * an immutable value in `$state.raw`: it is replaced, never mutated, so `core` always
 * receives a plain object.
 */
export class DocumentStore {
  history: History;
  fileName: string;
  /** Host token for saving back in place (a path on the desktop). */
  filePath: string | undefined = $state(undefined);
  problem: OpenProblem | null = $state.raw(null);
  status = $state('');
  busy = $state(false);
  selection: Selection | null = $state.raw(null);
  /** The document as last opened or saved, to tell whether there are unsaved changes (null: never saved as shown, e.g. a restored copy). */
  saved: Document | null;
  readonly doc: Document;
  /** Everything core computes from the document (energies J/mol). */
  readonly analysis: DocumentAnalysis;
  /** The document resolved by core: energies in J/mol with provenance, and findings. */
  readonly profile: ResolvedProfile;
  readonly dirty: boolean;
  /** Entries typed in the editor that did not resolve; each stays on its field until fixed or until its data changes. */
  held: readonly HeldInput[] = $state.raw([]);
  /** The held entries that still apply to the document shown (undo or a drag may have replaced their data). */
  readonly unresolved: readonly HeldInput[];
  /** The structure toolkit once loaded (on first meeting a structure, never at start-up). */
  toolkit: StructureToolkit | null = $state.raw(null);
  /** Why the toolkit could not be loaded, for the user. */
  toolkitProblem = $state('');
  /** The document's structures as read by the toolkit (null before it loads or without structures). */
  readonly structures: StructureTable | null;
  /** Molecule drawings for the figure, by point. */
  readonly drawings: ReadonlyMap<string, PointDrawing> | undefined;
  readonly #host: HostApi;

  constructor(host: HostApi, initial: Document, fileName: string) {
    this.#host = host;
    this.history = $state.raw(startHistory(initial));
    this.saved = $state.raw<Document | null>(initial);
    this.fileName = $state(fileName);
    this.doc = $derived(this.history.present);
    this.structures = $derived(this.toolkit && hasStructures(this.doc) ? readStructures(this.doc, this.toolkit) : null);
    this.drawings = $derived(this.structures ? pointDepictions(this.doc, this.structures) : undefined);
    this.unresolved = $derived(activeInputs(this.doc, this.held));
    this.analysis = $derived(this.unresolved.length === 0 ? analyseDocument(this.doc, this.structures)
      : analyseResolved(this.doc, markUnresolved(this.doc, resolveProfile(this.doc), this.unresolved)));
    this.profile = $derived(this.analysis.profile);
    this.dirty = $derived(this.doc !== this.saved);
  }

  /** Loads the structure toolkit if the document needs it (a separate chunk, fetched once). */
  async needToolkit(): Promise<void> {
    if (hasStructures(this.doc)) await this.loadToolkit();
  }

  /** Loads the structure toolkit (to check a structure being typed); null with {@link toolkitProblem} set when it cannot load. */
  async loadToolkit(): Promise<StructureToolkit | null> {
    if (this.toolkit) return this.toolkit;
    try {
      const { loadStructureToolkit } = await import('../../core/structure/loadStructureToolkit.ts');
      this.toolkit = await loadStructureToolkit();
      this.toolkitProblem = '';
    } catch (error) {
      this.toolkitProblem = `Structures cannot be drawn: the structure toolkit did not load (${error instanceof Error ? error.message : String(error)}).`;
    }
    return this.toolkit;
  }

  /** Records the result of an edit; an edit that changed nothing leaves history alone. An edit that took away the reference point says so in the status. */
  apply(next: Document, options: RecordOptions = {}): boolean {
    if (next === this.doc) return false;
    const fallback = referenceFallback(this.doc, next);
    if (fallback) this.status = fallback;
    this.history = record(this.history, next, options);
    return true;
  }

  /** Keeps what was typed at `place` that does not resolve, with why; the document keeps its last valid value. */
  holdInput(place: InputPlace, text: string, message: string): void {
    this.held = withInput(this.doc, this.held, place, text, message);
  }

  /** Forgets the entry held at `place` (it was fixed, or the field accepted a value). */
  releaseInput(place: InputPlace): void {
    const next = withoutInput(this.held, place);
    if (next !== this.held) this.held = next;
  }

  /** The entry held at `place`, while it still applies. */
  heldAt(place: InputPlace): HeldInput | undefined {
    return this.unresolved.find((h) => h.pathway === place.pathway && h.point === place.point && h.field === place.field);
  }

  /** Ends a drag or typing burst, so the next edit is its own undo step. */
  endGroup(): void {
    this.history = closeGroup(this.history);
  }

  get canUndo(): boolean { return this.history.past.length > 0; }
  get canRedo(): boolean { return this.history.future.length > 0; }

  undo(): void {
    if (!this.canUndo) return;
    this.history = undo(this.history);
    this.status = 'Undone.';
  }

  redo(): void {
    if (!this.canRedo) return;
    this.history = redo(this.history);
    this.status = 'Redone.';
  }

  /** Starts over with `doc` (a new or opened document): fresh history, nothing unsaved unless `unsaved` (a restored working copy). */
  replace(doc: Document, fileName: string, filePath?: string, unsaved = false): void {
    this.history = startHistory(doc);
    this.held = [];
    this.saved = unsaved ? null : doc;
    this.fileName = fileName;
    this.filePath = filePath;
    this.selection = null;
  }

  /** Opens text the user gave (a dropped file): valid replaces the document, invalid leaves it untouched. */
  openText(name: string, text: string, path?: string): boolean {
    const result = parseDocument(text);
    if (!result.ok) {
      this.problem = { fileName: name, errors: result.errors };
      this.status = `${name} was not opened: ${result.errors.length} problem${result.errors.length === 1 ? '' : 's'} found.`;
      return false;
    }
    this.replace(result.doc, name, path);
    this.problem = null;
    this.status = result.migratedFrom
      ? `Opened ${name} (updated from format version ${result.migratedFrom}; saving writes the new version).`
      : `Opened ${name}.`;
    return true;
  }

  /** Asks the host for a file; a valid one replaces the document, a bad one leaves it untouched. */
  open(): Promise<void> {
    return this.#openFrom(() => this.#host.openDocument());
  }

  /** Opens a file the user chose outside the window (recent list, command line, system). */
  openKnown(path: string): Promise<void> {
    return this.#openFrom(() => this.#host.openKnownFile(path));
  }

  /** Opens a file dropped on the window, through the host (so the desktop knows its path). */
  openDropped(dropped: File): Promise<void> {
    return this.#openFrom(() => this.#host.openDroppedFile(dropped));
  }

  async #openFrom(fetch: () => Promise<{ name: string; text: string; path?: string } | null>): Promise<void> {
    await this.#run(async () => {
      const file = await fetch();
      if (!file) return void (this.status = 'Open cancelled.');
      this.openText(file.name, file.text, file.path);
    }, 'open');
  }

  /** Saves under a name and place the user picks. */
  async saveAs(): Promise<boolean> {
    return this.#save(undefined);
  }

  /** Saves back to the file it came from when the host can, else asks like "save as". */
  async save(): Promise<boolean> {
    return this.#save(this.filePath);
  }

  /** Hands an exported figure or table to the host (the user picks where it goes). */
  async exportFile(request: ExportRequest): Promise<boolean> {
    let done = false;
    await this.#run(async () => {
      const saved = await this.#host.exportFile(request);
      if (!saved) return void (this.status = 'Export cancelled.');
      this.status = `Exported ${saved.name}.`;
      done = true;
    }, 'export');
    return done;
  }

  /** Hides the open-problem alert. */
  dismissProblem(): void {
    this.problem = null;
  }

  async #save(path: string | undefined): Promise<boolean> {
    let done = false;
    await this.#run(async () => {
      const doc = this.doc;
      const suggestedName = suggestFileName(this.fileName, doc.title, DOCUMENT_EXTENSION);
      const request = path ? { suggestedName, text: serializeDocument(doc), path } : { suggestedName, text: serializeDocument(doc) };
      const saved = await this.#host.saveDocument(request);
      if (!saved) return void (this.status = 'Save cancelled.');
      this.saved = doc;
      this.fileName = saved.name;
      this.filePath = saved.path;
      this.status = `Saved ${saved.name}.`;
      done = true;
    }, 'save');
    return done;
  }

  async #run(task: () => Promise<void>, verb: string): Promise<void> {
    if (this.busy) return;
    this.busy = true;
    try {
      await task();
    } catch (error) {
      const message = userMessage(error);
      this.status = `Could not ${verb}: ${message}`;
      if (verb === 'open') this.problem = { fileName: '', errors: [{ path: '(file)', message }] };
    } finally {
      this.busy = false;
    }
  }
}

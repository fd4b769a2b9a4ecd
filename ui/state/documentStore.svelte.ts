import { parseDocument, serializeDocument, type DocumentError } from '../../core/model/load.ts';
import type { Document } from '../../core/model/schema.ts';
import { resolveProfile } from '../../core/profile/resolve.ts';
import type { ResolvedProfile } from '../../core/profile/types.ts';
import { DOCUMENT_EXTENSION, type HostApi } from '../host/hostApi.ts';
import { suggestFileName } from './suggestFileName.ts';
import { userMessage } from './userMessage.ts';

/** Why the last open failed, for the alert region. */
export interface OpenProblem {
  fileName: string;
  errors: DocumentError[];
}

/**
 * The open document and what the shell shows about it. The document is an immutable value
 * in `$state.raw`: it is replaced, never mutated, so `core` always receives a plain object.
 */
export class DocumentStore {
  doc: Document;
  fileName: string;
  /** Host token for saving back in place (a path on the desktop). */
  filePath: string | undefined = $state(undefined);
  problem: OpenProblem | null = $state.raw(null);
  status = $state('');
  busy = $state(false);
  /** The document resolved by core: energies in J/mol with provenance, and findings. */
  readonly profile: ResolvedProfile;
  readonly #host: HostApi;

  constructor(host: HostApi, initial: Document, fileName: string) {
    this.#host = host;
    this.doc = $state.raw(initial);
    this.fileName = $state(fileName);
    this.profile = $derived(resolveProfile(this.doc));
  }

  /** Asks the host for a file; a valid one replaces the document, a bad one leaves it untouched. */
  async open(): Promise<void> {
    await this.#run(async () => {
      const file = await this.#host.openDocument();
      if (!file) return void (this.status = 'Open cancelled.');
      const result = parseDocument(file.text);
      if (!result.ok) {
        this.problem = { fileName: file.name, errors: result.errors };
        this.status = `${file.name} was not opened: ${result.errors.length} problem${result.errors.length === 1 ? '' : 's'} found.`;
        return;
      }
      this.doc = result.doc;
      this.fileName = file.name;
      this.filePath = file.path;
      this.problem = null;
      this.status = result.migratedFrom
        ? `Opened ${file.name} (updated from format version ${result.migratedFrom}; saving writes the new version).`
        : `Opened ${file.name}.`;
    }, 'open');
  }

  /** Saves under a name and place the user picks. */
  async saveAs(): Promise<void> {
    await this.#save(undefined);
  }

  /** Saves back to the file it came from when the host can, else asks like "save as". */
  async save(): Promise<void> {
    await this.#save(this.filePath);
  }

  /** Hides the open-problem alert. */
  dismissProblem(): void {
    this.problem = null;
  }

  async #save(path: string | undefined): Promise<void> {
    await this.#run(async () => {
      const suggestedName = suggestFileName(this.fileName, this.doc.title, DOCUMENT_EXTENSION);
      const request = path ? { suggestedName, text: serializeDocument(this.doc), path } : { suggestedName, text: serializeDocument(this.doc) };
      const saved = await this.#host.saveDocument(request);
      if (!saved) return void (this.status = 'Save cancelled.');
      this.fileName = saved.name;
      this.filePath = saved.path;
      this.status = `Saved ${saved.name}.`;
    }, 'save');
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

import type { CloseReply } from '../ui/host/hostApi.ts';
import type { Timers } from '../ui/host/autosaveScheduler.ts';

/** The user's answer to "save changes before closing?". */
export type CloseChoice = 'save' | 'discard' | 'cancel';

/** What to do once the renderer said whether the document is dirty (null: it did not answer). */
export function closeStepForReply(reply: CloseReply | null): 'close' | 'ask' {
  return reply !== null && !reply.dirty ? 'close' : 'ask';
}

/** What to do with the user's answer. */
export function closeStepForChoice(choice: CloseChoice): 'save' | 'close' | 'stay' {
  return choice === 'save' ? 'save' : choice === 'discard' ? 'close' : 'stay';
}

/** How long the window waits for the renderer's answer before asking without it (ms). */
export const CLOSE_REPLY_TIMEOUT_MS = 3_000;

/** What the guard needs from the window and the dialogs. */
export interface CloseGuardDeps {
  /** Sends the renderer the `closeRequested` command. */
  askRenderer(): void;
  /** Asks the user; `name` null when the renderer did not answer (its state is unknown). */
  askUser(name: string | null): Promise<CloseChoice>;
  /** Sends the renderer the `saveThenClose` command. */
  requestSave(): void;
  /** Drops the working copy of changes the user discarded. */
  discard(): Promise<void>;
  /** Closes the window for real (its close event then meets {@link CloseGuard.onClose} in the closing phase). */
  close(): void;
  timers: Timers;
  replyTimeoutMs?: number;
}

/**
 * Closing with unsaved changes asks to save, discard or cancel. The window's close event
 * is held back while the renderer is asked whether the document is dirty; a clean document
 * closes at once, a dirty one (or a renderer that does not answer) gets the question.
 */
export class CloseGuard {
  #phase: 'idle' | 'waiting' | 'asking' | 'saving' | 'closing' = 'idle';
  #timer: unknown = null;
  readonly #deps: CloseGuardDeps;

  constructor(deps: CloseGuardDeps) {
    this.#deps = deps;
  }

  /** From the window's close event: true lets the window close now. */
  onClose(): boolean {
    if (this.#phase === 'closing') return true;
    if (this.#phase === 'waiting' || this.#phase === 'asking') return false;
    this.#phase = 'waiting';
    this.#timer = this.#deps.timers.set(() => void this.#answered(null), this.#deps.replyTimeoutMs ?? CLOSE_REPLY_TIMEOUT_MS);
    this.#deps.askRenderer();
    return false;
  }

  /** From the renderer's `replyClose`. Replies nobody asked for are ignored. */
  async onReply(reply: CloseReply): Promise<void> {
    if (this.#phase === 'waiting') return this.#answered(reply);
    if (this.#phase === 'saving' && !reply.dirty) this.#close();
  }

  async #answered(reply: CloseReply | null): Promise<void> {
    if (this.#phase !== 'waiting') return;
    this.#deps.timers.clear(this.#timer);
    if (closeStepForReply(reply) === 'close') return this.#close();
    this.#phase = 'asking';
    const step = closeStepForChoice(await this.#deps.askUser(reply?.name ?? null));
    if (step === 'stay') this.#phase = 'idle';
    else if (step === 'save') {
      // A cancelled save sends no reply: the window stays, and a later close starts over.
      this.#phase = 'saving';
      this.#deps.requestSave();
    } else {
      await this.#deps.discard();
      this.#close();
    }
  }

  #close(): void {
    this.#phase = 'closing';
    this.#deps.close();
  }
}

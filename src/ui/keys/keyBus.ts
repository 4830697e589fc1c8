/**
 * One queue for every key of the app. Keys are handled strictly one at a time: each goes to
 * the handlers as they stand after the previous key has been drawn, so a burst of keys (in
 * one chunk or several) acts exactly as the same keys typed slowly — no handler ever sees the
 * state from before an earlier key of the burst.
 *
 * Handlers come from `useKeys`: the shell's global handler first (it may take the key), then
 * the others in the order they registered. A handler marked `text` is a text field: while one
 * is active, printable runs (a paste) go to it whole instead of one character at a time.
 */
import { firstOf, isText, splitKeys, type KeyInfo, type KeyPress } from './splitKeys.js';

/** Returning true means the key was taken: later handlers do not see it. */
export type KeyHandler = (input: string, key: KeyInfo) => boolean | void;

export interface KeyEntry {
  handler: KeyHandler;
  active: boolean;
  readonly global: boolean;
  readonly text: boolean;
}

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

export class KeyBus {
  private readonly entries: KeyEntry[] = [];
  private readonly queue: KeyPress[] = [];
  private pumping = false;
  private stopped = false;
  /** Counts renders of the components that handle keys; the queue waits for it to rest. */
  renders = 0;
  onError: (e: unknown) => void = () => {};

  register(entry: KeyEntry): () => void {
    this.entries.push(entry);
    return () => {
      const i = this.entries.indexOf(entry);
      if (i >= 0) this.entries.splice(i, 1);
    };
  }

  /** True while a text field has the keyboard. */
  textMode(): boolean {
    return this.entries.some((e) => e.text && e.active);
  }

  /** Raw input from the terminal: split into keys and queued. */
  push(chunk: string): void {
    this.queue.push(...splitKeys(chunk));
    if (!this.pumping) void this.pump();
  }

  stop(): void {
    this.stopped = true;
    this.queue.length = 0;
  }

  /** Keys queued or being handled (0 when every key sent so far has been handled and drawn). */
  pending(): number {
    return this.queue.length + (this.pumping ? 1 : 0);
  }

  private async pump(): Promise<void> {
    this.pumping = true;
    try {
      while (this.queue.length > 0 && !this.stopped) {
        let p = this.queue.shift()!;
        // Outside a text field, "+++" is three presses of "+".
        if (isText(p) && !this.textMode()) {
          const [head, rest] = firstOf(p);
          if (rest) this.queue.unshift(rest);
          p = head;
        }
        this.dispatch(p);
        await this.settle();
      }
    } finally {
      this.pumping = false;
    }
  }

  private dispatch(p: KeyPress): void {
    // Who receives this key is decided before any of them acts on it.
    const receivers = this.entries.filter((e) => e.active);
    receivers.sort((a, b) => Number(b.global) - Number(a.global));
    for (const e of receivers) {
      try {
        if (e.handler(p.input, p.key) === true) return;
      } catch (err) {
        // A handler that throws (an engine called synchronously) must not end the app.
        this.onError(err);
      }
    }
  }

  /** Wait until React has drawn the effects of the last key (renders, then their effects). */
  private async settle(): Promise<void> {
    let quiet = 0;
    for (let round = 0; round < 40 && quiet < 3; round++) {
      const before = this.renders;
      await nextTurn();
      quiet = this.renders === before ? quiet + 1 : 0;
    }
  }
}

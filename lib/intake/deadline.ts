import { describeTimeLimit, UnreadableError } from "./unreadable";

/**
 * One reading's time budget. Readers check it between pages and race each awaited step against
 * it. A race cannot stop synchronous work already running on this thread (mammoth's XML parse,
 * for one); that is bounded by the size checks instead, and the reading job can run readers in a
 * worker thread when it needs a hard stop.
 */
export class Deadline {
  private endsAt: number;

  constructor(readonly limitMs: number) {
    this.endsAt = performance.now() + limitMs;
  }

  remainingMs(): number {
    return Math.max(0, this.endsAt - performance.now());
  }

  /** Gives back time spent on work that has a budget of its own (an OCR'd page of a PDF). */
  extend(ms: number): void {
    this.endsAt += Math.max(0, ms);
  }

  /** Throws the Unreadable "time limit" error once the budget is spent. */
  check(): void {
    if (this.remainingMs() <= 0) throw this.timeLimitError();
  }

  /**
   * Settles with `work`, or rejects with the time-limit error when the budget runs out first;
   * `onTimeout` then lets the caller stop what it started (terminate a worker, destroy a parser).
   */
  async race<T>(work: Promise<T>, onTimeout?: () => void): Promise<T> {
    // A late rejection after we gave up must not become an unhandled rejection: in Node that
    // ends the process.
    work.catch(() => undefined);
    let timer: NodeJS.Timeout | undefined;
    const expiry = new Promise<never>((_, reject) => {
      timer = setTimeout(() => {
        onTimeout?.();
        reject(this.timeLimitError());
      }, this.remainingMs());
    });
    try {
      return await Promise.race([work, expiry]);
    } finally {
      clearTimeout(timer);
    }
  }

  private timeLimitError(): UnreadableError {
    return new UnreadableError("time_limit", describeTimeLimit(this.limitMs));
  }
}

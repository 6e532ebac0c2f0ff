/**
 * A background lane of the array explorer, as reactive state: it takes requests keyed by the
 * inputs they are for (`inputsKey`), starts the newest one after a short settling delay, keeps the
 * newest result with its key, and drops anything that arrives for a request that was replaced or
 * cancelled. The island reads `view` in its markup; the lane logic is tested in Node
 * (tests/explorer/backgroundLane.test.ts) with a fake runner and fake timers.
 */
import type { ExplorerJob, ExplorerJobResult } from './explorerJobs';
import type { LaneCallbacks } from './workerLane';
import { measureSince, startMark } from './timing';

/** What runs the jobs: a WorkerLane (a Web Worker per lane) or the main thread (`mainThreadRunner`). */
export interface JobRunner {
  run(job: ExplorerJob, callbacks: LaneCallbacks): void;
  cancel(): void;
  dispose(): void;
}

/** What the island shows of a lane. */
export interface LaneView<T> {
  /** The newest result, with the key of the inputs it was made for (kept when the inputs change). */
  result: { key: string; value: T } | null;
  /** The request waiting to start or running, with its progress 0…1; null when idle. */
  running: { key: string; progress: number } | null;
  /** The failure of the latest request, with its key; cleared by the next request or a cancel. */
  error: { key: string; message: string } | null;
}

export interface LaneOptions<T> {
  /** Takes this lane's value out of a job result (null: not this lane's kind, ignored). */
  pick: (result: ExplorerJobResult) => T | null;
  /** Settling delay before a request starts, ms (a newer request within it replaces it unstarted). */
  delayMs: number;
  /** Performance measure recorded from start to result (e.g. 'explorer-worker-uv'); none when omitted. */
  measureName?: string;
}

export class BackgroundLane<T> {
  /** Reactive copy for the markup. The lane itself reads only `state`, so an effect that calls `request` does not depend on `view`. */
  view = $state.raw<LaneView<T>>({ result: null, running: null, error: null });
  private state: LaneView<T> = { result: null, running: null, error: null };
  private timer: ReturnType<typeof setTimeout> | null = null;
  /** Serial number of the newest request; callbacks of any other request are ignored. */
  private serial = 0;

  constructor(
    private readonly runner: JobRunner,
    private readonly options: LaneOptions<T>,
  ) {}

  /** Whether the newest result was made for these inputs. */
  hasResultFor(key: string): boolean {
    return this.state.result?.key === key;
  }

  /**
   * Asks for a job for the inputs with this key. It starts after `delayMs` (or `delayMs` given
   * here); a newer request or a cancel before then replaces it, and once started, a newer request
   * supersedes it in the runner (the WorkerLane terminates the running worker).
   */
  request(key: string, job: ExplorerJob, delayMs = this.options.delayMs): void {
    this.clearTimer();
    const serial = ++this.serial;
    this.update({ running: { key, progress: 0 }, error: null });
    const start = () => {
      this.timer = null;
      const mark = this.options.measureName ? startMark(`${this.options.measureName}-start`) : null;
      this.runner.run(job, {
        onProgress: (fraction) => {
          if (serial === this.serial) this.update({ running: { key, progress: fraction } });
        },
        onDone: (result) => {
          const value = this.options.pick(result);
          if (serial !== this.serial || value === null) return;
          if (this.options.measureName) measureSince(this.options.measureName, mark);
          this.update({ result: { key, value }, running: null });
        },
        onError: (message) => {
          if (serial === this.serial) this.update({ running: null, error: { key, message } });
        },
      });
    };
    if (delayMs > 0) this.timer = setTimeout(start, delayMs);
    else start();
  }

  /** Stops the waiting or running request; its result, if it still arrives, is dropped. The last result stays. */
  cancel(): void {
    this.clearTimer();
    this.serial++;
    this.runner.cancel();
    this.update({ running: null, error: null });
  }

  /**
   * Drops a request still waiting for its settling delay (it never starts and is no longer shown
   * as running); a request already started keeps running. For an effect's cleanup.
   */
  cancelWaiting(): void {
    if (this.timer === null) return;
    this.clearTimer();
    this.serial++;
    this.update({ running: null });
  }

  /** Cancels and releases the runner (its worker). */
  dispose(): void {
    this.clearTimer();
    this.serial++;
    this.runner.dispose();
  }

  private clearTimer(): void {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
  }

  private update(change: Partial<LaneView<T>>): void {
    this.state = { ...this.state, ...change };
    this.view = this.state;
  }
}

/** Runs a job at once on the main thread (for work small enough not to need a worker). */
export function mainThreadRunner(run: (job: ExplorerJob) => ExplorerJobResult): JobRunner {
  return {
    run: (job, callbacks) => {
      try {
        callbacks.onDone(run(job), 0);
      } catch (error) {
        callbacks.onError(error instanceof Error ? error.message : String(error));
      }
    },
    cancel: () => {},
    dispose: () => {},
  };
}

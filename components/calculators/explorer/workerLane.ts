/**
 * One lane of background work: at most one job at a time in its own Web Worker. A new job
 * supersedes the running one by terminating its worker (a long computation cannot be
 * interrupted otherwise) and starting a fresh one, so the newest inputs always win.
 */
import type { ExplorerJob, ExplorerJobResult, ExplorerWorkerMessage } from './explorerJobs';

export interface LaneCallbacks {
  onProgress?: (fraction: number) => void;
  onDone: (result: ExplorerJobResult, elapsedMs: number) => void;
  onError: (message: string) => void;
}

export class WorkerLane {
  private worker: Worker | null = null;
  private busy = false;
  private nextId = 1;
  private currentId = 0;
  private callbacks: LaneCallbacks | null = null;

  constructor(private readonly create: () => Worker) {}

  /** Starts a job, cancelling any job still running in this lane. */
  run(job: ExplorerJob, callbacks: LaneCallbacks): void {
    if (this.busy) this.stopWorker();
    if (!this.worker) {
      this.worker = this.create();
      this.worker.onmessage = (event: MessageEvent<ExplorerWorkerMessage>) => this.receive(event.data);
      this.worker.onerror = (event) => {
        event.preventDefault();
        this.busy = false;
        this.callbacks?.onError(event.message || 'The background computation failed to start.');
      };
    }
    this.currentId = this.nextId++;
    this.callbacks = callbacks;
    this.busy = true;
    this.worker.postMessage({ id: this.currentId, job: JSON.parse(JSON.stringify(job)) });
  }

  /** Cancels the running job, if any. */
  cancel(): void {
    if (this.busy) this.stopWorker();
    this.callbacks = null;
  }

  dispose(): void {
    this.worker?.terminate();
    this.worker = null;
    this.busy = false;
    this.callbacks = null;
  }

  private stopWorker(): void {
    this.worker?.terminate();
    this.worker = null;
    this.busy = false;
  }

  private receive(message: ExplorerWorkerMessage): void {
    if (message.id !== this.currentId || !this.callbacks) return;
    if (message.type === 'progress') {
      this.callbacks.onProgress?.(message.fraction);
      return;
    }
    this.busy = false;
    if (message.type === 'done') this.callbacks.onDone(message.result, message.elapsedMs);
    else this.callbacks.onError(message.message);
  }
}

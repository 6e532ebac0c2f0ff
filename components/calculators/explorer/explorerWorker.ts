/// <reference lib="webworker" />
/**
 * Web Worker of the array explorer: runs one job per message and posts progress, then the result
 * (or an error). Loaded with `new Worker(new URL('./explorerWorker.ts', import.meta.url), { type: 'module' })`.
 */
import { runExplorerJob, type ExplorerJob, type ExplorerWorkerMessage } from './explorerJobs';

const post = (message: ExplorerWorkerMessage) => (self as unknown as DedicatedWorkerGlobalScope).postMessage(message);

self.onmessage = (event: MessageEvent<{ id: number; job: ExplorerJob }>) => {
  const { id, job } = event.data;
  const start = performance.now();
  let lastPost = 0;
  try {
    const result = runExplorerJob(job, (fraction) => {
      const now = performance.now();
      if (now - lastPost > 250 || fraction >= 1) {
        lastPost = now;
        post({ id, type: 'progress', fraction });
      }
    });
    post({ id, type: 'done', result, elapsedMs: performance.now() - start });
  } catch (error) {
    post({ id, type: 'error', message: error instanceof Error ? error.message : String(error) });
  }
};

/**
 * The background jobs of the array explorer, as plain functions of their request so the Web
 * Worker (explorerWorker.ts) stays a thin message loop and the jobs are tested without a browser.
 */
import type { CalcInputs, CalcResult } from '../../../calc/calculator';
import { computeArrayExplorer, type ArrayExplorerData } from '../../../calc/calculators/arrayExplorer';
import { explorerUvMap, type UvMap } from '../../../calc/explorer/uvMap';
import { explorerScanSweep, type ScanSweep } from '../../../calc/explorer/scanSweep';

export type ExplorerJob =
  | { kind: 'complete'; inputs: CalcInputs }
  | { kind: 'uv'; inputs: CalcInputs; count: number }
  | { kind: 'sweep'; inputs: CalcInputs };

export type ExplorerJobResult =
  | { kind: 'complete'; result: CalcResult<ArrayExplorerData> }
  | { kind: 'uv'; map: UvMap }
  | { kind: 'sweep'; sweep: ScanSweep };

/** Messages from the worker: progress (0…1), a result, or an error message. */
export type ExplorerWorkerMessage =
  | { id: number; type: 'progress'; fraction: number }
  | { id: number; type: 'done'; result: ExplorerJobResult; elapsedMs: number }
  | { id: number; type: 'error'; message: string };

/** Runs one job. */
export function runExplorerJob(job: ExplorerJob, onProgress: (fraction: number) => void = () => {}): ExplorerJobResult {
  switch (job.kind) {
    case 'complete': return { kind: 'complete', result: computeArrayExplorer(job.inputs, 'complete') };
    case 'uv': return { kind: 'uv', map: explorerUvMap(job.inputs, job.count, onProgress) };
    case 'sweep': return { kind: 'sweep', sweep: explorerScanSweep(job.inputs, onProgress) };
  }
}

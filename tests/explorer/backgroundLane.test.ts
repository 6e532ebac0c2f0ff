import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { BackgroundLane, mainThreadRunner, type JobRunner } from '../../components/calculators/explorer/backgroundLane.svelte';
import { WorkerLane, type LaneCallbacks } from '../../components/calculators/explorer/workerLane';
import type { ExplorerJob, ExplorerJobResult, ExplorerWorkerMessage } from '../../components/calculators/explorer/explorerJobs';
import type { ScanSweep } from '../../calc/explorer/scanSweep';

// The explorer's background lanes: newest request wins, stale results are dropped, cancel stops.
// Jobs here are placeholders (inputs {}); what a job computes is tested in tests/calc/explorer.

/** A runner that records each run and lets the test answer it later. */
function fakeRunner() {
  const runs: { job: ExplorerJob; callbacks: LaneCallbacks }[] = [];
  const runner: JobRunner & { cancels: number; disposed: boolean } = {
    cancels: 0,
    disposed: false,
    run: (job, callbacks) => void runs.push({ job, callbacks }),
    cancel: () => void runner.cancels++,
    dispose: () => void (runner.disposed = true),
  };
  return { runner, runs };
}

const sweepJob: ExplorerJob = { kind: 'sweep', inputs: {} };
const sweepResult = (fixedDeg: number): ExplorerJobResult => ({ kind: 'sweep', sweep: { fixedDeg } as unknown as ScanSweep });
const pickSweep = (r: ExplorerJobResult) => (r.kind === 'sweep' ? r.sweep.fixedDeg : null);

describe('BackgroundLane', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('starts a request after the settling delay, shows it running, then keeps the result with its key', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 120 });
    lane.request('A', sweepJob);
    expect(lane.view.running).toEqual({ key: 'A', progress: 0 });
    vi.advanceTimersByTime(119);
    expect(runs).toHaveLength(0);
    vi.advanceTimersByTime(1);
    expect(runs).toHaveLength(1);
    runs[0].callbacks.onProgress?.(0.5);
    expect(lane.view.running).toEqual({ key: 'A', progress: 0.5 });
    runs[0].callbacks.onDone(sweepResult(10), 5);
    expect(lane.view).toEqual({ result: { key: 'A', value: 10 }, running: null, error: null });
    expect(lane.hasResultFor('A')).toBe(true);
    expect(lane.hasResultFor('B')).toBe(false);
  });

  it('newest request wins: a request replaced within the delay never starts', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 120 });
    lane.request('A', { kind: 'sweep', inputs: { n: 1 } });
    vi.advanceTimersByTime(60);
    lane.request('B', { kind: 'sweep', inputs: { n: 2 } });
    vi.advanceTimersByTime(120);
    expect(runs.map((r) => r.job.inputs)).toEqual([{ n: 2 }]);
    expect(lane.view.running?.key).toBe('B');
  });

  it('drops the progress, result and error of a superseded request', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 0 });
    lane.request('A', sweepJob);
    lane.request('B', sweepJob);
    expect(runs).toHaveLength(2);
    runs[0].callbacks.onProgress?.(0.9);
    runs[0].callbacks.onDone(sweepResult(1), 5);
    runs[0].callbacks.onError('late failure');
    expect(lane.view).toEqual({ result: null, running: { key: 'B', progress: 0 }, error: null });
    runs[1].callbacks.onDone(sweepResult(2), 5);
    expect(lane.view.result).toEqual({ key: 'B', value: 2 });
  });

  it('cancel stops the request, drops its late result and keeps the last result', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 0 });
    lane.request('A', sweepJob);
    runs[0].callbacks.onDone(sweepResult(1), 5);
    lane.request('B', sweepJob);
    lane.cancel();
    expect(runner.cancels).toBe(1);
    expect(lane.view.running).toBeNull();
    runs[1].callbacks.onDone(sweepResult(2), 5);
    expect(lane.view.result).toEqual({ key: 'A', value: 1 });
  });

  it('cancel before the delay has passed means the request never starts', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 120 });
    lane.request('A', sweepJob);
    lane.cancel();
    vi.advanceTimersByTime(500);
    expect(runs).toHaveLength(0);
  });

  it('cancelWaiting drops a request still in its delay, but leaves a started one running', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 120 });
    lane.request('A', sweepJob);
    lane.cancelWaiting();
    vi.advanceTimersByTime(500);
    expect(runs).toHaveLength(0);
    expect(lane.view.running).toBeNull();
    lane.request('B', sweepJob);
    vi.advanceTimersByTime(120);
    lane.cancelWaiting();
    runs[0].callbacks.onDone(sweepResult(2), 5);
    expect(lane.view.result).toEqual({ key: 'B', value: 2 });
    expect(runner.cancels).toBe(0);
  });

  it('records the failure of the newest request, and the next request clears it', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 0 });
    lane.request('A', sweepJob);
    runs[0].callbacks.onError('out of memory');
    expect(lane.view).toEqual({ result: null, running: null, error: { key: 'A', message: 'out of memory' } });
    lane.request('B', sweepJob);
    expect(lane.view.error).toBeNull();
  });

  it('ignores a result of another kind (pick gives null)', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 0 });
    lane.request('A', sweepJob);
    runs[0].callbacks.onDone({ kind: 'uv', map: {} as never }, 5);
    expect(lane.view.result).toBeNull();
  });

  it('dispose releases the runner and drops anything still in flight', () => {
    const { runner, runs } = fakeRunner();
    const lane = new BackgroundLane(runner, { pick: pickSweep, delayMs: 0 });
    lane.request('A', sweepJob);
    lane.dispose();
    expect(runner.disposed).toBe(true);
    runs[0].callbacks.onDone(sweepResult(1), 5);
    expect(lane.view.result).toBeNull();
  });
});

describe('mainThreadRunner', () => {
  it('answers at once with the result, or with the error message when the job throws', () => {
    const done = vi.fn();
    const failed = vi.fn();
    mainThreadRunner(() => sweepResult(3)).run(sweepJob, { onDone: done, onError: failed });
    expect(done).toHaveBeenCalledWith(sweepResult(3), 0);
    mainThreadRunner(() => {
      throw new Error('too many points');
    }).run(sweepJob, { onDone: done, onError: failed });
    expect(failed).toHaveBeenCalledWith('too many points');
  });
});

describe('WorkerLane', () => {
  /** A stand-in for a Web Worker: records posts and termination; the test sends its messages. */
  class FakeWorker {
    static made: FakeWorker[] = [];
    posted: { id: number; job: ExplorerJob }[] = [];
    terminated = false;
    onmessage: ((event: MessageEvent<ExplorerWorkerMessage>) => void) | null = null;
    onerror: ((event: ErrorEvent) => void) | null = null;
    constructor() {
      FakeWorker.made.push(this);
    }
    postMessage(message: { id: number; job: ExplorerJob }) {
      this.posted.push(message);
    }
    terminate() {
      this.terminated = true;
    }
    send(message: ExplorerWorkerMessage) {
      this.onmessage?.({ data: message } as MessageEvent<ExplorerWorkerMessage>);
    }
  }
  beforeEach(() => (FakeWorker.made = []));

  it('a new job terminates the busy worker and runs in a fresh one; only the newest job reports', () => {
    const lane = new WorkerLane(() => new FakeWorker() as unknown as Worker);
    const first = { onDone: vi.fn(), onError: vi.fn() };
    const second = { onDone: vi.fn(), onError: vi.fn() };
    lane.run(sweepJob, first);
    lane.run(sweepJob, second);
    const [w1, w2] = FakeWorker.made;
    expect(w1.terminated).toBe(true);
    w2.send({ id: w1.posted[0].id, type: 'done', result: sweepResult(1), elapsedMs: 1 });
    expect(second.onDone).not.toHaveBeenCalled();
    w2.send({ id: w2.posted[0].id, type: 'done', result: sweepResult(2), elapsedMs: 1 });
    expect(second.onDone).toHaveBeenCalledWith(sweepResult(2), 1);
    expect(first.onDone).not.toHaveBeenCalled();
  });

  it('reuses an idle worker, and cancel terminates a busy one', () => {
    const lane = new WorkerLane(() => new FakeWorker() as unknown as Worker);
    const callbacks = { onDone: vi.fn(), onError: vi.fn() };
    lane.run(sweepJob, callbacks);
    const [w1] = FakeWorker.made;
    w1.send({ id: w1.posted[0].id, type: 'done', result: sweepResult(1), elapsedMs: 1 });
    lane.run(sweepJob, callbacks);
    expect(FakeWorker.made).toHaveLength(1);
    lane.cancel();
    expect(w1.terminated).toBe(true);
  });
});

/**
 * Runs the ambient-vibration analysis off the main thread: a Web Worker
 * (vibration-worker.ts) that imports calc/. Where workers are unavailable or fail (old
 * browsers, tests in Node), the same calc function runs here instead. (A static import: the
 * instruments' chunk loads lazily with the survey screen, and a dynamic one made the
 * bundler hoist calc helpers shared with the first screen into the vibration chunk.)
 */
import { analyseAmbientRecord } from '../../calc/index.js';
import type { AmbientAnalysis, Direction } from '../../calc/index.js';

/** What the worker is sent: the raw record (times in s) and the comparison settings. */
export interface AnalysisRequest {
  timesS: Float64Array;
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
  longEdgeAlong: Direction | null;
  referenceFrequencyHz: number | null;
  referenceRelativeUncertainty: number | null;
  referenceIsEmpirical: boolean;
}

export type AnalysisReply =
  { ok: true; analysis: AmbientAnalysis } | { ok: false; message: string };

async function inline(request: AnalysisRequest): Promise<AmbientAnalysis> {
  // Yield once so the "analysing" state can render before the main thread is busy.
  await new Promise((resolve) => setTimeout(resolve, 0));
  return analyseAmbientRecord(request);
}

function inWorker(request: AnalysisRequest): Promise<AmbientAnalysis> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./vibration-worker.ts', import.meta.url), {
      type: 'module',
    });
    const done = () => worker.terminate();
    worker.onmessage = (e: MessageEvent<AnalysisReply>) => {
      done();
      if (e.data.ok) resolve(e.data.analysis);
      else reject(new Error(e.data.message));
    };
    worker.onerror = (e) => {
      done();
      reject(new Error(e.message || 'worker failed'));
    };
    worker.postMessage(request);
  });
}

/** Analyses a recording; prefers a worker, falls back to the main thread. */
export async function analyseRecording(request: AnalysisRequest): Promise<AmbientAnalysis> {
  if (typeof Worker === 'function') {
    try {
      return await inWorker(request);
    } catch {
      // A worker that cannot start (blocked, unsupported module workers) must not lose the record.
    }
  }
  return inline(request);
}

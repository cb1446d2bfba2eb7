/**
 * Web Worker: analyses one ambient vibration record with calc/ and posts the result back,
 * so two minutes of samples never freeze the screen.
 */
import { analyseAmbientRecord } from '../../calc/vibration/index.js';
import type { AnalysisReply, AnalysisRequest } from './vibration-analysis.js';

// The page's tsconfig has the DOM library, not the worker one; this is the part we use.
const scope = self as unknown as {
  onmessage: ((e: MessageEvent<AnalysisRequest>) => void) | null;
  postMessage(message: AnalysisReply): void;
};

scope.onmessage = (e) => {
  try {
    scope.postMessage({ ok: true, analysis: analyseAmbientRecord(e.data) });
  } catch (err) {
    scope.postMessage({ ok: false, message: err instanceof Error ? err.message : String(err) });
  }
};

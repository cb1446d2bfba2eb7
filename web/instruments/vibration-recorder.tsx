/**
 * `<VibrationRecorder expectedPeriodS={…} onResult={(measured, rawRecord) => …} />`: the
 * phone as a vibration sensor. It records 60–120 s at the phone's own rate with the time
 * stamps it delivers, analyses the record in a Web Worker (calc/vibration), shows the
 * fundamental frequency, damping, confidence, the stiffness indicator against the expected
 * period and every caveat, and hands over the measured frequency (or null) with the raw
 * record when the inspector saves.
 */
import { useEffect, useRef, useState } from 'preact/hooks';
import { EMPIRICAL_REFERENCE_SCATTER } from '../../calc/index.js';
import type { AmbientAnalysis, Direction, MeasuredFrequencyInput } from '../../calc/index.js';
import type { InstrumentEntry } from '../../forms/instruments/index.js';
import { t } from '../i18n/index.js';
import { fixed } from './format.js';
import { vibrationEntry } from './instrument-entries.js';
import { MotionNotice } from './motion-notice.js';
import { SpectrumPlot } from './spectrum-plot.js';
import { useMotion } from './use-motion.js';
import { analyseRecording } from './vibration-analysis.js';
import {
  clampDuration,
  MAX_DURATION_S,
  MIN_DURATION_S,
  VibrationSession,
  type VibrationProgress,
} from './vibration-session.js';
import './instrument-styles.js';

export interface VibrationRecorderProps {
  /** The expected fundamental period, s (e.g. from the storey model or a code formula). */
  expectedPeriodS?: number | null;
  /** True when the expected period was measured on this building before (a strong reference). */
  expectedIsMeasured?: boolean;
  /** Called when the inspector saves: the measured frequency (null without a clear peak) and the raw record. */
  onResult: (measured: MeasuredFrequencyInput | null, rawRecord: InstrumentEntry) => void;
  /** Storey the phone lies on (0 = ground), stored with the record. */
  storey?: number | null;
  /** Recording length, s; clamped to 60–120. Default 90. */
  durationS?: number;
  initiallyOpen?: boolean;
}

type Stage = 'closed' | 'setup' | 'recording' | 'analysing' | 'result' | 'failed';

const DURATIONS = [MIN_DURATION_S, 90, MAX_DURATION_S];
/** Progress is redrawn at most this often, ms (our choice). */
const RENDER_EVERY_MS = 250;
/** Below this the stiffness indicator is worth a sentence (our choice; the verdict weighs it). */
const LOW_STIFFNESS = 0.7;

interface WakeLockLike {
  release(): Promise<void>;
}

async function keepScreenOn(): Promise<WakeLockLike | null> {
  const nav = navigator as Navigator & {
    wakeLock?: { request(type: 'screen'): Promise<WakeLockLike> };
  };
  try {
    return (await nav.wakeLock?.request('screen')) ?? null;
  } catch {
    return null; // refused or unsupported: the inspector is told to keep the screen on
  }
}

export function VibrationRecorder(props: VibrationRecorderProps) {
  const { expectedPeriodS = null, expectedIsMeasured = false, onResult, storey = null } = props;
  const [stage, setStage] = useState<Stage>(props.initiallyOpen ? 'setup' : 'closed');
  const [durationS, setDurationS] = useState(clampDuration(props.durationS));
  const [longEdge, setLongEdge] = useState<Direction | null>(null);
  const [progress, setProgress] = useState<VibrationProgress | null>(null);
  const [analysis, setAnalysis] = useState<AmbientAnalysis | null>(null);
  const [saved, setSaved] = useState(false);
  const sessionRef = useRef<VibrationSession | null>(null);
  const wakeLock = useRef<WakeLockLike | null>(null);
  const lastRender = useRef(0);
  const motion = useMotion(
    (s) => sessionRef.current?.feed(s),
    (ms) => sessionRef.current?.setReportedInterval(ms),
  );
  const referenceHz = expectedPeriodS && expectedPeriodS > 0 ? 1 / expectedPeriodS : null;

  const analyse = async (session: VibrationSession) => {
    setStage('analysing');
    const raw = session.raw();
    const t0 = raw.timesMs[0] ?? 0;
    try {
      const result = await analyseRecording({
        timesS: Float64Array.from(raw.timesMs, (v) => (v - t0) / 1000),
        x: raw.x,
        y: raw.y,
        z: raw.z,
        longEdgeAlong: longEdge,
        referenceFrequencyHz: referenceHz,
        referenceRelativeUncertainty: expectedIsMeasured ? null : EMPIRICAL_REFERENCE_SCATTER,
        referenceIsEmpirical: !expectedIsMeasured,
      });
      setAnalysis(result);
      setStage('result');
    } catch {
      setStage('failed');
    }
  };

  const finish = (session: VibrationSession) => {
    motion.stop();
    void wakeLock.current?.release().catch(() => undefined);
    wakeLock.current = null;
    void analyse(session);
  };

  const unsubscribeSession = useRef<(() => void) | null>(null);
  useEffect(
    () => () => {
      unsubscribeSession.current?.();
      motion.stop();
      void wakeLock.current?.release().catch(() => undefined);
    },
    [],
  );

  const start = async () => {
    unsubscribeSession.current?.();
    const s = new VibrationSession(durationS);
    sessionRef.current = s;
    setAnalysis(null);
    setSaved(false);
    setProgress(s.progress);
    let finished = false;
    unsubscribeSession.current = s.subscribe((p) => {
      const now = performance.now();
      if (p.done || now - lastRender.current >= RENDER_EVERY_MS) {
        lastRender.current = now;
        setProgress(p);
      }
      if (p.done && !finished) {
        finished = true;
        finish(s);
      }
    });
    const ok = await motion.start(); // called inside the tap: Safari's permission rule
    if (!ok) return;
    s.start();
    setStage('recording');
    wakeLock.current = await keepScreenOn();
  };

  if (stage === 'closed') {
    return (
      <div class="instrument instrument--closed">
        <button type="button" class="button button--wide" onClick={() => setStage('setup')}>
          {t('instruments.vib.open')}
        </button>
      </div>
    );
  }

  const save = () => {
    const s = sessionRef.current;
    if (!s) return;
    const raw = s.raw();
    const entry = vibrationEntry(raw, analysis, {
      longEdgeAlong: longEdge,
      storey,
      expectedPeriodS,
      reportedIntervalMs: raw.reportedIntervalMs,
    });
    setSaved(true);
    onResult(analysis?.measured ?? null, entry);
  };

  const e = analysis?.estimate ?? null;
  return (
    <section class="instrument" aria-labelledby="vibration-title">
      <h3 id="vibration-title" class="instrument__title">
        {t('instruments.vib.title')}
      </h3>
      <MotionNotice state={motion.state} onRetry={() => void start()} />

      {stage === 'setup' && (
        <>
          <p class="instrument__hint">{t('instruments.vib.intro')}</p>
          <fieldset class="instrument__choice">
            <legend>{t('instruments.vib.longEdge')}</legend>
            {(['x', 'y', null] as const).map((d) => (
              <label key={String(d)} class="instrument__option">
                <input
                  type="radio"
                  name="vibration-long-edge"
                  checked={longEdge === d}
                  onChange={() => setLongEdge(d)}
                />
                {t(
                  d === 'x'
                    ? 'instruments.vib.longEdgeX'
                    : d === 'y'
                      ? 'instruments.vib.longEdgeY'
                      : 'instruments.vib.longEdgeUnknown',
                )}
              </label>
            ))}
          </fieldset>
          <fieldset class="instrument__choice">
            <legend>{t('instruments.vib.duration')}</legend>
            {DURATIONS.map((d) => (
              <label key={d} class="instrument__option">
                <input
                  type="radio"
                  name="vibration-duration"
                  checked={durationS === d}
                  onChange={() => setDurationS(d)}
                />
                {t('instruments.vib.durationValue', { seconds: d })}
              </label>
            ))}
          </fieldset>
          <button
            type="button"
            class="button button--primary button--wide"
            onClick={() => void start()}
          >
            {t('instruments.vib.start')}
          </button>
        </>
      )}

      {stage === 'recording' && progress && (
        <div class="instrument__busy">
          <p aria-live="polite">
            {t('instruments.vib.recording', {
              elapsed: Math.floor(progress.elapsedS),
              total: progress.durationS,
            })}
          </p>
          <progress
            class="instrument__progress"
            max={1}
            value={progress.progress}
            aria-label={t('instruments.vib.recording', {
              elapsed: Math.floor(progress.elapsedS),
              total: progress.durationS,
            })}
          />
          <p class="instrument__note">
            {t('instruments.vib.rate', {
              count: progress.sampleCount,
              rate: progress.rateHz === null ? '–' : fixed(progress.rateHz, 0),
            })}
          </p>
          <p class="instrument__hint">{t('instruments.vib.keepStill')}</p>
          <button
            type="button"
            class="button button--wide"
            onClick={() => sessionRef.current?.stop()}
          >
            {t('instruments.vib.stop')}
          </button>
        </div>
      )}

      {stage === 'analysing' && (
        <p class="instrument__busy" role="status">
          {t('instruments.vib.analysing')}
        </p>
      )}

      {stage === 'failed' && (
        <div class="instrument__notice" role="alert">
          <p>{t('instruments.vib.analysisFailed')}</p>
          <button
            type="button"
            class="button button--wide"
            onClick={() => sessionRef.current && void analyse(sessionRef.current)}
          >
            {t('instruments.vib.retry')}
          </button>
        </div>
      )}

      {stage === 'result' && analysis && (
        <div class="instrument__result" aria-live="polite">
          {e ? (
            <>
              <p class="instrument__figure" data-testid="vibration-estimate">
                {t('instruments.vib.estimate', {
                  frequency: fixed(e.frequencyHz, 2),
                  period: fixed(1 / e.frequencyHz, 3),
                })}
              </p>
              {e.frequencyUncertaintyHz !== null && (
                <p class="instrument__note">
                  {t('instruments.vib.uncertainty', {
                    uncertainty: fixed(e.frequencyUncertaintyHz, 3),
                  })}
                </p>
              )}
              <p class="instrument__note">
                {e.dampingRatio === null
                  ? t('instruments.vib.noDamping')
                  : e.dampingUncertainty === null
                    ? t('instruments.vib.damping', { percent: fixed(e.dampingRatio * 100, 1) })
                    : t('instruments.vib.dampingWithError', {
                        percent: fixed(e.dampingRatio * 100, 1),
                        uncertainty: fixed(e.dampingUncertainty * 100, 1),
                      })}
              </p>
              <p class="instrument__note">
                {t('instruments.vib.confidence', { percent: Math.round(e.confidence * 100) })}
              </p>
              <p class="instrument__note">
                {e.direction
                  ? t('instruments.vib.direction', { direction: e.direction })
                  : t('instruments.vib.directionUnknown')}
              </p>
              {analysis.secondary && (
                <p class="instrument__note">
                  {t('instruments.vib.secondary', {
                    frequency: fixed(analysis.secondary.frequencyHz, 2),
                    direction: analysis.secondary.direction ?? '?',
                  })}
                </p>
              )}
              {referenceHz !== null && expectedPeriodS !== null && (
                <p class="instrument__note">
                  {t('instruments.vib.expected', {
                    frequency: fixed(referenceHz, 2),
                    period: fixed(expectedPeriodS, 3),
                  })}
                </p>
              )}
              {analysis.stiffness && (
                <>
                  <p class="instrument__figure">
                    {t('instruments.vib.stiffness', {
                      ratio: fixed(analysis.stiffness.stiffnessRatio, 2),
                      uncertainty: fixed(analysis.stiffness.uncertainty, 2),
                    })}
                  </p>
                  {analysis.stiffness.stiffnessRatio < LOW_STIFFNESS && (
                    <p class="instrument__issue">{t('instruments.vib.stiffnessLow')}</p>
                  )}
                </>
              )}
            </>
          ) : (
            <p class="instrument__figure" data-testid="vibration-no-estimate">
              {t(
                `instruments.vib.status.${analysis.status === 'estimate' ? 'no-clear-peak' : analysis.status}`,
              )}
            </p>
          )}
          {analysis.spectrum && (
            <SpectrumPlot spectrum={analysis.spectrum} peakHz={e?.frequencyHz ?? null} />
          )}
          <details class="instrument__caveats">
            <summary>{t('instruments.vib.caveatTitle')}</summary>
            <ul>
              {analysis.caveats.map((c) => (
                <li key={c}>{t(`instruments.vib.caveat.${c}`)}</li>
              ))}
              <li>{t('instruments.screening')}</li>
            </ul>
          </details>
          {saved ? (
            <p class="instrument__note" role="status">
              {t('instruments.vib.saved')}
            </p>
          ) : (
            <button type="button" class="button button--primary button--wide" onClick={save}>
              {t(e ? 'instruments.vib.save' : 'instruments.vib.saveRecordOnly')}
            </button>
          )}
          <button type="button" class="button button--wide" onClick={() => setStage('setup')}>
            {t('instruments.vib.again')}
          </button>
        </div>
      )}

      <button
        type="button"
        class="button button--wide instrument__close"
        onClick={() => {
          unsubscribeSession.current?.();
          unsubscribeSession.current = null;
          motion.stop();
          sessionRef.current?.stop();
          setStage('closed');
        }}
      >
        {t('instruments.vib.close')}
      </button>
    </section>
  );
}

/**
 * `<TiltMeter onResult={(r) => …} />`: the phone as an inclinometer. Two positions with a
 * reversal in between cancel the sensor's zero offset; the lean is shown in degrees and as a
 * drift ratio with its uncertainty, and handed over with `onResult` when the inspector
 * accepts it (together with the raw readings, as an instrument-record entry).
 */
import { useEffect, useMemo, useRef, useState } from 'preact/hooks';
import type { Direction } from '../../calc/index.js';
import { t } from '../i18n/index.js';
import { fixed, toDegrees } from './format.js';
import { tiltEntry } from './instrument-entries.js';
import { MotionNotice } from './motion-notice.js';
import type { TiltMeterResult } from './survey-adapters.js';
import { TiltSession, type TiltView } from './tilt-session.js';
import { useMotion } from './use-motion.js';
import './instrument-styles.js';

export interface TiltMeterProps {
  /** Called once the inspector accepts a finished reading. */
  onResult: (result: TiltMeterResult) => void;
  /** Storey (0 = ground) and plan direction the reading is for, stored with the raw record. */
  storey?: number | null;
  direction?: Direction | null;
  /** Open at once instead of showing a single button. */
  initiallyOpen?: boolean;
  /** What the reading is for (e.g. "Storey 1, along x"), added to the button's accessible name. */
  context?: string;
}

/** Re-render at most this often while readings stream in, ms (our choice: 10 per second). */
const RENDER_EVERY_MS = 100;

export function TiltMeter({
  onResult,
  storey = null,
  direction = null,
  initiallyOpen = false,
  context,
}: TiltMeterProps) {
  const [open, setOpen] = useState(initiallyOpen);
  const session = useMemo(() => new TiltSession(), []);
  const [view, setView] = useState<TiltView>(session.view);
  const [used, setUsed] = useState(false);
  const lastRender = useRef(0);
  const shown = useRef<TiltView>(session.view);
  const motion = useMotion((s) => session.feed(s));

  useEffect(
    () =>
      session.subscribe((v) => {
        const now = performance.now();
        const before = shown.current;
        // Changes of step always show at once; the live reading is throttled.
        if (
          v.activity !== before.activity ||
          v.phase !== before.phase ||
          v.issue !== before.issue ||
          v.outcome !== before.outcome ||
          now - lastRender.current >= RENDER_EVERY_MS
        ) {
          lastRender.current = now;
          shown.current = v;
          setView(v);
        }
      }),
    [session],
  );

  const titleId = `tilt-title-${storey ?? 'n'}-${direction ?? 'n'}`;
  if (!open) {
    return (
      <div class="instrument instrument--closed">
        <button
          type="button"
          class="button button--wide"
          onClick={() => {
            setOpen(true);
            void motion.start();
          }}
        >
          {t('instruments.tilt.open')}
          {context && <span class="visually-hidden"> ({context})</span>}
        </button>
      </div>
    );
  }

  const close = () => {
    motion.stop();
    session.reset();
    setUsed(false);
    setOpen(false);
  };
  const outcome = view.outcome;
  const busy = view.activity !== 'waiting';
  return (
    <section class="instrument" aria-labelledby={titleId}>
      <h3 id={titleId} class="instrument__title">
        {t('instruments.tilt.title')}
      </h3>
      <MotionNotice state={motion.state} onRetry={() => void motion.start()} />
      {!outcome && (
        <>
          <p class="instrument__hint">{t('instruments.tilt.intro')}</p>
          <p class="instrument__step">
            {t(view.phase === 2 ? 'instruments.tilt.position2' : 'instruments.tilt.position1')}
          </p>
          {view.phase === 2 && view.issue === null && (
            <p class="instrument__note">
              {t('instruments.tilt.position1Done', {
                degrees: fixed(toDegrees(session.firstAngleRad ?? 0), 2),
              })}
            </p>
          )}
          {view.liveAngleRad !== null && (
            <p class="instrument__live">
              {t('instruments.tilt.live', { degrees: fixed(toDegrees(view.liveAngleRad), 2) })}
              {' · '}
              <span class={view.liveStill ? 'instrument__still' : 'instrument__moving'}>
                {t(view.liveStill ? 'instruments.tilt.liveStill' : 'instruments.tilt.liveMoving')}
              </span>
            </p>
          )}
          {busy ? (
            <div class="instrument__busy" aria-live="polite">
              <p>
                {view.activity === 'settling'
                  ? t('instruments.tilt.settling')
                  : t('instruments.tilt.averaging', { percent: Math.round(view.progress * 100) })}
              </p>
              <progress
                class="instrument__progress"
                max={1}
                value={view.progress}
                aria-label={t('instruments.tilt.averaging', {
                  percent: Math.round(view.progress * 100),
                })}
              />
              <button type="button" class="button button--wide" onClick={() => session.cancel()}>
                {t('instruments.tilt.cancel')}
              </button>
            </div>
          ) : (
            <button
              type="button"
              class="button button--primary button--wide"
              disabled={motion.state !== 'granted'}
              onClick={() => session.begin()}
            >
              {t('instruments.tilt.measure', { n: view.phase === 2 ? 2 : 1 })}
            </button>
          )}
          {view.issue && (
            <p class="instrument__issue" role="alert">
              <span aria-hidden="true">✖ </span>
              {t(`instruments.tilt.issue.${view.issue}`)}
            </p>
          )}
        </>
      )}
      {outcome && (
        <div class="instrument__result" aria-live="polite">
          <p class="instrument__figure">
            {t('instruments.tilt.result', {
              degrees: fixed(toDegrees(Math.abs(outcome.reversal.tiltRad)), 2),
              uncertainty: fixed(toDegrees(outcome.reversal.uncertaintyRad), 2),
            })}
          </p>
          <p class="instrument__figure">
            {t('instruments.tilt.drift', {
              percent: fixed(outcome.driftRatio * 100, 2),
              uncertainty: fixed(outcome.driftUncertainty * 100, 2),
            })}
          </p>
          <p class="instrument__note">
            {t('instruments.tilt.offset', {
              degrees: fixed(toDegrees(outcome.reversal.offsetRad), 2),
            })}
          </p>
          {used ? (
            <p class="instrument__note" role="status">
              {t('instruments.tilt.used')}
            </p>
          ) : (
            <button
              type="button"
              class="button button--primary button--wide"
              onClick={() => {
                setUsed(true);
                onResult({
                  tiltRad: outcome.reversal.tiltRad,
                  uncertaintyRad: outcome.reversal.uncertaintyRad,
                  offsetRad: outcome.reversal.offsetRad,
                  driftRatio: outcome.driftRatio,
                  driftUncertainty: outcome.driftUncertainty,
                  entry: tiltEntry(outcome, { storey, direction }),
                });
              }}
            >
              {t('instruments.tilt.use')}
            </button>
          )}
          <button
            type="button"
            class="button button--wide"
            onClick={() => {
              session.reset();
              setUsed(false);
            }}
          >
            {t('instruments.tilt.again')}
          </button>
        </div>
      )}
      <p class="instrument__caution">{t('instruments.tilt.caution')}</p>
      <button type="button" class="button button--wide instrument__close" onClick={close}>
        {t('instruments.tilt.close')}
      </button>
    </section>
  );
}

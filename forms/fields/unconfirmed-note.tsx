/**
 * Marks a value the app filled in (a default, a copy from the storey below, the team's
 * hazard of the day) that the inspector has not confirmed. One tap on "Confirm" accepts it;
 * typing or choosing another value confirms too.
 */
import { t } from '../../web/i18n/index.js';

export function UnconfirmedNote(props: {
  id: string;
  label: string;
  onConfirm?: (() => void) | undefined;
  reason?: string | undefined;
  /** Only a short mark; the confirm action lives elsewhere (e.g. "Confirm all storeys"). */
  compact?: boolean | undefined;
}) {
  if (props.compact) {
    return (
      <p class="unconfirmed-mark" id={`${props.id}-unconfirmed`}>
        <span aria-hidden="true">◌ </span>
        {t('field.unconfirmedShort')}
      </p>
    );
  }
  return (
    <div class="unconfirmed" id={`${props.id}-unconfirmed`}>
      <p class="unconfirmed__text">
        <span aria-hidden="true">◌ </span>
        {props.reason ?? t('field.unconfirmed')}
      </p>
      {props.onConfirm && (
        <button
          type="button"
          class="button button--small"
          aria-label={t('field.confirmLabel', { label: props.label })}
          onClick={props.onConfirm}
        >
          {t('field.confirm')}
        </button>
      )}
    </div>
  );
}

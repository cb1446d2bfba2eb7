/**
 * Checks the text of a number field against its spec and says, in the user's units, what
 * is wrong or unusual. Pure: the same function serves the field as it is typed and the step
 * summary that lists entries still to fix.
 */
import {
  formatNumber,
  formatNumberForInput,
  fromSI,
  parseQuantity,
  shownUnit,
  type UnitId,
  type UnitSystem,
} from '../units/index.js';
import { t } from '../../web/i18n/index.js';
import type { NumberSpec } from './number-spec.js';

export type NumberCheck =
  /** Nothing typed in an optional field: the value is "not known" (null). */
  | { state: 'empty' }
  | { state: 'invalid'; message: string }
  | {
      state: 'valid';
      valueSI: number;
      /** A warning for an unusual value (kept and saved), or null. */
      warning: string | null;
      /** How interpreted text was read ("Read as 2.7 m."), or null for a plain number. */
      readAs: string | null;
    };

/** The unit symbol as shown to people (from the catalogue). */
export function unitSymbol(unit: UnitId): string {
  return t(`unit.${unit}`);
}

/** A limit in the shown unit, rounded to display decimals and without trailing zeros. */
function limitText(valueSI: number, spec: NumberSpec, system: UnitSystem): string {
  const unit = shownUnit(spec.quantity, system);
  return formatNumberForInput(
    Number(formatNumber(fromSI(valueSI, spec.quantity, system), unit)),
    unit,
  );
}

/** Checks `text` typed into a field with `spec`, shown in `system`. */
export function checkNumber(text: string, spec: NumberSpec, system: UnitSystem): NumberCheck {
  const unit = shownUnit(spec.quantity, system);
  const label = t(spec.label);
  const u = unitSymbol(unit);
  const parsed = parseQuantity(text, spec.quantity, system);
  if (!parsed.ok) {
    switch (parsed.reason) {
      case 'empty':
        return spec.required
          ? { state: 'invalid', message: t('check.empty', { label, unit: u }).trim() }
          : { state: 'empty' };
      case 'mixed-separators':
        return { state: 'invalid', message: t('check.mixed', { label }) };
      case 'unknown-unit':
        return {
          state: 'invalid',
          message: t('check.unknownUnit', { label, typed: parsed.unit, unit: u }),
        };
      default: {
        const example = spec.example === undefined ? '' : limitText(spec.example, spec, system);
        return {
          state: 'invalid',
          message: (u === ''
            ? t('check.notNumberPlain', { label, example })
            : t('check.notNumber', { label, unit: u, example })
          ).trim(),
        };
      }
    }
  }
  const v = parsed.valueSI;
  if (spec.integer && !Number.isInteger(parsed.shownValue)) {
    return { state: 'invalid', message: t('check.wholeNumber', { label }) };
  }
  if (spec.min !== undefined) {
    const below = spec.minExclusive ? v <= spec.min : v < spec.min;
    if (below) {
      if (spec.min >= 0 && v < 0) {
        return { state: 'invalid', message: t('check.negative', { label }) };
      }
      const limit = limitText(spec.min, spec, system);
      return {
        state: 'invalid',
        message: t(spec.minExclusive ? 'check.moreThan' : 'check.atLeast', {
          label,
          limit,
          unit: u,
        }).trim(),
      };
    }
  }
  if (spec.max !== undefined && v > spec.max) {
    return {
      state: 'invalid',
      message: t('check.atMost', { label, limit: limitText(spec.max, spec, system), unit: u }),
    };
  }
  let warning: string | null = null;
  const shownValue = formatNumberForInput(parsed.shownValue, unit);
  if (spec.usualMin !== undefined && v < spec.usualMin) {
    warning = t('check.unusualLow', {
      label,
      value: shownValue,
      unit: u,
      min: limitText(spec.usualMin, spec, system),
      max: spec.usualMax === undefined ? '' : limitText(spec.usualMax, spec, system),
    });
  } else if (spec.usualMax !== undefined && v > spec.usualMax) {
    warning = t('check.unusualHigh', {
      label,
      value: shownValue,
      unit: u,
      max: limitText(spec.usualMax, spec, system),
    });
  }
  if (warning !== null && spec.usualNote) warning = `${warning} ${t(spec.usualNote)}`;
  const readAs = parsed.interpreted
    ? t('check.readAs', { value: shownValue, unit: u }).replace(/ \.$/, '.')
    : null;
  return { state: 'valid', valueSI: v, warning, readAs };
}

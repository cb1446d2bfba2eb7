/**
 * What the inspector sets once and the forms use all day: the unit system, their name and
 * team (prefilled into each new survey), and the team's hazard of the day.
 *
 * Units, name and team are kept in localStorage (read synchronously, so the first field
 * already shows the right unit). The team hazard is kept in device storage's settings with
 * the day it was set: "remembered for the team's day" means a new survey is prefilled with
 * it only on that same local day, and always marked as unconfirmed.
 */
import { spectrumSpecSchema } from '../../../forms/index.js';
import { isUnitSystem, type UnitSystem } from '../../../forms/units/index.js';
import type { SpectrumSpec } from '../../../calc/index.js';
import { createStore, useStore } from '../../app/store.js';
import { getDefaultStore } from '../../storage/index.js';

const KEY = 'grainline.fieldPreferences';
/** Key of the team hazard in device storage's settings store. */
const TEAM_HAZARD_SETTING = 'teamHazard';

export interface FieldPreferences {
  units: UnitSystem;
  inspector: string;
  team: string;
}

export interface TeamHazard {
  hazard: SpectrumSpec;
  /** Local calendar day it applies to, YYYY-MM-DD. */
  day: string;
  /** When it was last set, ISO time. */
  setAt: string;
}

const defaults: FieldPreferences = { units: 'si', inspector: '', team: '' };

function readJson(key: string): unknown {
  try {
    return JSON.parse(localStorage.getItem(key) ?? 'null') as unknown;
  } catch {
    return null;
  }
}

function writeJson(key: string, value: unknown): void {
  try {
    localStorage.setItem(key, JSON.stringify(value));
  } catch {
    // Private mode or full storage: the setting still holds for this session.
  }
}

/** The stored preferences; anything unreadable falls back to the defaults. */
export function readPreferences(): FieldPreferences {
  const raw = readJson(KEY);
  if (typeof raw !== 'object' || raw === null) return defaults;
  const r = raw as Record<string, unknown>;
  return {
    units: isUnitSystem(r.units) ? r.units : defaults.units,
    inspector: typeof r.inspector === 'string' ? r.inspector.slice(0, 500) : '',
    team: typeof r.team === 'string' ? r.team.slice(0, 500) : '',
  };
}

/** The local calendar day of `now`, YYYY-MM-DD. */
export function localDay(now: Date): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${y}-${m}-${d}`;
}

/** Reads a stored team hazard value; null when none or unreadable. */
export function parseTeamHazard(raw: unknown): TeamHazard | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const r = raw as Record<string, unknown>;
  const parsed = spectrumSpecSchema.safeParse(r.hazard);
  if (!parsed.success || typeof r.day !== 'string' || typeof r.setAt !== 'string') return null;
  return { hazard: parsed.data, day: r.day, setAt: r.setAt };
}

/** The team hazard as last loaded (whatever its day). */
export const teamHazardStore = createStore<TeamHazard | null>(null);

/** Loads the team hazard from device storage (settings). */
export async function loadTeamHazard(): Promise<TeamHazard | null> {
  try {
    const value = parseTeamHazard(await getDefaultStore().getSetting(TEAM_HAZARD_SETTING));
    teamHazardStore.set(value);
    return value;
  } catch {
    return teamHazardStore.get();
  }
}

/** The team hazard when it was set today (local day), else null. */
export async function todaysTeamHazard(now: Date = new Date()): Promise<TeamHazard | null> {
  const h = await loadTeamHazard();
  return h !== null && h.day === localDay(now) ? h : null;
}

/** Remembers `hazard` as the team's hazard for today (device storage, settings). */
export async function rememberTeamHazard(
  hazard: SpectrumSpec,
  now: Date = new Date(),
): Promise<void> {
  const current = teamHazardStore.get();
  if (
    current !== null &&
    current.day === localDay(now) &&
    JSON.stringify(current.hazard) === JSON.stringify(hazard)
  ) {
    return;
  }
  const value: TeamHazard = { hazard, day: localDay(now), setAt: now.toISOString() };
  teamHazardStore.set(value);
  try {
    await getDefaultStore().setSetting(TEAM_HAZARD_SETTING, value);
  } catch {
    // Not remembered for the next survey; the survey itself keeps its hazard.
  }
}

/** Forgets the team hazard. */
export async function forgetTeamHazard(): Promise<void> {
  teamHazardStore.set(null);
  try {
    await getDefaultStore().setSetting(TEAM_HAZARD_SETTING, null);
  } catch {
    // Nothing else to do: the setting stays until the next try.
  }
}

export const preferencesStore = createStore<FieldPreferences>(readPreferences());

/** Changes some preferences and stores them. */
export function setPreferences(patch: Partial<FieldPreferences>): void {
  const next = { ...preferencesStore.get(), ...patch };
  writeJson(KEY, next);
  preferencesStore.set(next);
}

/** The current preferences, re-rendering on change. */
export function usePreferences(): FieldPreferences {
  return useStore(preferencesStore);
}

/** The current unit system. */
export function useUnits(): UnitSystem {
  return useStore(preferencesStore).units;
}

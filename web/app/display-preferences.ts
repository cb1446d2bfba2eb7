/**
 * Display preferences that must apply before the first paint: high contrast for sunlight and
 * text size. They live in localStorage (not IndexedDB) because they are read synchronously at
 * start-up and losing them costs nothing.
 */
const KEY = 'grainline.display';

export interface DisplayPreferences {
  highContrast: boolean;
  largeText: boolean;
}

const defaults: DisplayPreferences = { highContrast: false, largeText: false };

/** Reads the stored preferences; anything unreadable falls back to the defaults. */
export function readDisplayPreferences(): DisplayPreferences {
  try {
    const raw: unknown = JSON.parse(localStorage.getItem(KEY) ?? 'null');
    if (typeof raw !== 'object' || raw === null) return defaults;
    const r = raw as Record<string, unknown>;
    return { highContrast: r.highContrast === true, largeText: r.largeText === true };
  } catch {
    return defaults;
  }
}

/** Stores the preferences and applies them at once. */
export function saveDisplayPreferences(prefs: DisplayPreferences): void {
  try {
    localStorage.setItem(KEY, JSON.stringify(prefs));
  } catch {
    // Private mode or a full disk: the setting still applies for this session.
  }
  applyDisplayPreferences(prefs);
}

/** Sets data attributes on <html> that the stylesheet keys on. */
export function applyDisplayPreferences(
  prefs: DisplayPreferences = readDisplayPreferences(),
): void {
  const root = document.documentElement;
  root.dataset.contrast = prefs.highContrast ? 'high' : 'normal';
  root.dataset.text = prefs.largeText ? 'large' : 'normal';
}

/**
 * Whether the browser may delete this app's data, and how much space is used. Stores
 * nothing; reads `navigator.storage` and the display mode.
 *
 * Browsers keep site data "best effort" unless it is persisted: under storage pressure, or
 * (WebKit) after seven days without a visit unless the app is installed to the home
 * screen, they may delete all of it. `navigator.storage.persist()` asks to keep it; the
 * first save calls it once. The settings screen shows `storageStatus()`.
 */
import { en, type MessageCatalogue } from '../../forms/index.js';
import type { QuotaEstimate } from './errors.js';

/** The part of `navigator.storage` used here (injectable for tests). */
export interface StorageManagerLike {
  persist?: () => Promise<boolean>;
  persisted?: () => Promise<boolean>;
  estimate?: () => Promise<{ usage?: number; quota?: number }>;
}

export interface StorageStatus {
  usageBytes: number | null;
  quotaBytes: number | null;
  /** null when the browser cannot say. */
  persisted: boolean | null;
  /** Running as an installed app (home screen / standalone window). */
  installed: boolean;
  /** Data may be deleted by the browser: not persisted and not installed. */
  evictionRisk: boolean;
  /** A sentence to show when there is a risk, else null. */
  warning: string | null;
}

export function defaultStorageManager(): StorageManagerLike | null {
  return typeof navigator !== 'undefined' && navigator.storage ? navigator.storage : null;
}

/** True when the page runs as an installed app. */
export function defaultIsInstalled(): boolean {
  if (typeof window === 'undefined') return false;
  const standalone = (navigator as { standalone?: boolean }).standalone === true; // iOS Safari
  const mm = typeof window.matchMedia === 'function' ? window.matchMedia.bind(window) : null;
  return (
    standalone ||
    (mm !== null &&
      (mm('(display-mode: standalone)').matches ||
        mm('(display-mode: fullscreen)').matches ||
        mm('(display-mode: minimal-ui)').matches))
  );
}

export class Persistence {
  private requested: Promise<boolean | null> | null = null;

  constructor(
    private readonly storage: StorageManagerLike | null,
    private readonly isInstalled: () => boolean,
    private readonly catalogue: MessageCatalogue = en,
  ) {}

  /**
   * Asks the browser once to keep the data (called after the first successful save).
   * Resolves to whether persistence is granted, or null where the API is missing.
   */
  requestOnce(): Promise<boolean | null> {
    if (this.requested === null) {
      this.requested = (async () => {
        const s = this.storage;
        if (!s?.persist) return null;
        try {
          if (s.persisted && (await s.persisted())) return true;
          return await s.persist();
        } catch {
          return null;
        }
      })();
    }
    return this.requested;
  }

  async estimate(): Promise<QuotaEstimate> {
    try {
      const e = await this.storage?.estimate?.();
      return { usage: e?.usage ?? null, quota: e?.quota ?? null };
    } catch {
      return { usage: null, quota: null };
    }
  }

  /** Usage, quota, persistence and the eviction warning, for the settings screen. */
  async status(): Promise<StorageStatus> {
    const { usage, quota } = await this.estimate();
    let persisted: boolean | null = null;
    try {
      persisted = this.storage?.persisted ? await this.storage.persisted() : null;
    } catch {
      persisted = null;
    }
    const installed = this.isInstalled();
    const evictionRisk = persisted !== true && !installed;
    return {
      usageBytes: usage,
      quotaBytes: quota,
      persisted,
      installed,
      evictionRisk,
      warning: evictionRisk ? this.catalogue.storage.evictionRisk : null,
    };
  }
}

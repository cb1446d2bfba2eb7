/**
 * `useSurveyDraft(id)`: the survey screens' handle on one survey. A thin preact wrapper
 * around DraftSaver (draft-saver.ts), which does the work; stores nothing itself.
 *
 *   const { record, update, saveState, error, conflict } = useSurveyDraft(id);
 *   update({ address: text });                       // top-level fields
 *   update((r) => ({ ...r, building: { ...r.building, planXM: 12 } }));
 *
 * `saveState` is 'saved' only after the save's transaction completed.
 */
import { useCallback, useEffect, useRef, useState } from 'preact/hooks';
import { getDefaultStore } from './default-store.js';
import { DraftSaver, type DraftPatch, type DraftState } from './draft-saver.js';
import type { SurveyStore } from './survey-store.js';

export interface SurveyDraft extends DraftState {
  update(patch: DraftPatch): void;
  flush(): Promise<void>;
  retry(): Promise<void>;
  keepMine(): Promise<void>;
  takeTheirs(): Promise<void>;
}

const INITIAL: DraftState = {
  record: null,
  loading: true,
  saveState: 'saved',
  error: null,
  conflict: null,
  otherTabs: 0,
  updatedElsewhere: false,
};

export function useSurveyDraft(id: string, options: { store?: SurveyStore } = {}): SurveyDraft {
  const store = options.store ?? getDefaultStore();
  const saverRef = useRef<DraftSaver | null>(null);
  const [state, setState] = useState<DraftState>(INITIAL);

  useEffect(() => {
    const saver = new DraftSaver({ store, id });
    saverRef.current = saver;
    const unsubscribe = saver.subscribe(setState);
    void saver.load();
    return () => {
      unsubscribe();
      saverRef.current = null;
      void saver.dispose(); // flushes first
    };
  }, [id, store]);

  const update = useCallback((patch: DraftPatch) => saverRef.current?.update(patch), []);
  const flush = useCallback(() => saverRef.current?.flush() ?? Promise.resolve(), []);
  const retry = useCallback(() => saverRef.current?.retry() ?? Promise.resolve(), []);
  const keepMine = useCallback(() => saverRef.current?.keepMine() ?? Promise.resolve(), []);
  const takeTheirs = useCallback(() => saverRef.current?.takeTheirs() ?? Promise.resolve(), []);

  return { ...state, update, flush, retry, keepMine, takeTheirs };
}

import { useEffect, useRef, useState } from 'react';
import type { RepairDraft } from '@/features/repairs/utils/repair-draft';
import { loadDraft, saveDraft } from '@/lib/drafts';

/**
 * The repair form's state, kept on the phone at every change (IndexedDB, photos included), so a
 * reload or a trip to another screen picks it up where it was. `null` while it is read back.
 */
export function useRepairDraft(key: string, makeInitial: () => RepairDraft) {
  const [state, setState] = useState<{ key: string; draft: RepairDraft } | null>(null);
  const initial = useRef(makeInitial);
  initial.current = makeInitial;

  useEffect(() => {
    let live = true;
    void loadDraft<RepairDraft>(key).then((stored) => {
      if (live) setState({ key, draft: stored ?? initial.current() });
    });
    return () => {
      live = false;
    };
  }, [key]);

  // Every change is written at once: IndexedDB writes are quick, and a phone can drop the page at any moment.
  useEffect(() => {
    if (state) void saveDraft(state.key, state.draft);
  }, [state]);

  const draft = state?.key === key ? state.draft : null;
  const setDraft = (change: (d: RepairDraft) => RepairDraft) => setState((s) => (s ? { key: s.key, draft: change(s.draft) } : s));
  return [draft, setDraft] as const;
}

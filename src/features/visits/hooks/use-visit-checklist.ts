import type { ChecklistItem, VisitDetail } from '@shared/schemas/visits';
import { onlineManager } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { useSaveVisitChecklist } from '@/features/visits/api/mutations';
import { clearDraft, draftKeys, readDraft, writeDraft } from '@/features/visits/utils/local-draft';

export type ChecklistSaveState = 'saved' | 'saving' | 'unsaved';

/**
 * The visit's checklist as the technician ticks it. Each change is kept on the phone at once,
 * then sent (`PATCH /api/visits/:id`); changes made while a save runs go in the next one. Until
 * the server has the latest, the phone's copy is shown and kept (a reload, no signal); it is
 * sent again when the page opens and when the browser says the network is back. Without a
 * network a save is not even tried: the query client would hold it paused, "Saving…" for as long
 * as the signal is gone.
 */
export function useVisitChecklist(visit: VisitDetail, editable: boolean) {
  const key = draftKeys.checklist(visit.id);
  const { mutateAsync: save } = useSaveVisitChecklist();
  const [draft, setDraft] = useState<ChecklistItem[] | null>(() => (editable ? readDraft<ChecklistItem[]>(key) : null));
  const [state, setState] = useState<ChecklistSaveState>(draft ? 'unsaved' : 'saved');
  const [error, setError] = useState<unknown>(null);
  const latest = useRef<ChecklistItem[] | null>(draft);
  const running = useRef(false);

  const send = useCallback(async () => {
    if (running.current || !latest.current) return;
    // No network: a request would only wait (paused); say so, and send when it is back.
    if (!onlineManager.isOnline()) {
      setState('unsaved');
      return;
    }
    running.current = true;
    setState('saving');
    try {
      let sent: ChecklistItem[];
      do {
        sent = latest.current;
        await save({ id: visit.id, checklist: sent });
      } while (sent !== latest.current);
      clearDraft(key);
      latest.current = null;
      setDraft(null);
      setState('saved');
      setError(null);
    } catch (e) {
      setState('unsaved');
      setError(e);
    } finally {
      running.current = false;
    }
  }, [key, save, visit.id]);

  // A draft left from before (a reload, no signal): send it now, and again when the network is back.
  useEffect(() => {
    if (!editable) return;
    if (latest.current) void send();
    return onlineManager.subscribe((online) => {
      if (online) void send();
    });
  }, [editable, send]);

  // The server's checklist unless the phone holds something newer.
  const items = draft ?? visit.checklist;

  const change = (next: ChecklistItem[]) => {
    latest.current = next;
    setDraft(next);
    writeDraft(key, next);
    void send();
  };

  return {
    items,
    state,
    error,
    toggle: (index: number) => change(items.map((item, i) => (i === index ? { ...item, done: !item.done } : item))),
    retry: () => void send(),
    /** After the visit is closed: nothing is left to send. */
    forget: () => {
      latest.current = null;
      clearDraft(key);
    },
  };
}

// What a technician typed on a visit, kept on the phone until the server has it: a checklist
// ticked without signal, a summary half written when the page reloads. localStorage may be
// missing or full (private browsing): then the draft lives only as long as the page.

const prefix = 'gridkeep:visit:';

export const draftKeys = {
  checklist: (visitId: string) => `${prefix}${visitId}:checklist`,
  close: (visitId: string) => `${prefix}${visitId}:close`,
};

export function readDraft<T>(key: string): T | null {
  try {
    const raw = window.localStorage.getItem(key);
    return raw ? (JSON.parse(raw) as T) : null;
  } catch {
    return null;
  }
}

export function writeDraft(key: string, value: unknown): void {
  try {
    window.localStorage.setItem(key, JSON.stringify(value));
  } catch {
    /* no storage: the page keeps it */
  }
}

export function clearDraft(key: string): void {
  try {
    window.localStorage.removeItem(key);
  } catch {
    /* nothing kept */
  }
}

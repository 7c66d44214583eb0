import clsx from 'clsx';
import { CircleAlert, CircleCheck, X } from 'lucide-react';
import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from 'react';

type Tone = 'success' | 'danger';
interface Toast {
  id: number;
  tone: Tone;
  message: string;
}

/**
 * Where toasts show, covering as little as possible. On a phone: full width, above the
 * technician's bottom navigation (and the home indicator). On a wide screen: bottom left, clear of
 * the right-hand panels (a ticket's details, a cabinet card); in the office shell, inside the side
 * navigation's width, below its links. The technician shell keeps its bottom navigation at every
 * width, so its toasts stay above it there too.
 */
const placement = clsx(
  'pointer-events-none fixed inset-x-0 bottom-[calc(5rem+env(safe-area-inset-bottom))] z-50 flex flex-col items-center gap-2 px-4',
  'md:right-auto md:items-start md:px-0 md:left-6 md:w-96 md:bottom-6',
  'lg:left-3 lg:w-[calc(theme(spacing.sidebar)-1.5rem)] lg:bottom-3',
  'md:[body:has([data-shell=technician])_&]:bottom-[calc(5.5rem+env(safe-area-inset-bottom))]',
);

const ToastContext = createContext<((message: string, tone?: Tone) => void) | null>(null);

/** Short confirmations ("Invitation sent") at the bottom of the screen, read out politely. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setToasts((all) => all.filter((t) => t.id !== id)), []);
  const show = useCallback(
    (message: string, tone: Tone = 'success') => {
      const id = nextId.current++;
      setToasts((all) => [...all.slice(-2), { id, tone, message }]);
      setTimeout(() => dismiss(id), tone === 'danger' ? 8000 : 5000);
    },
    [dismiss],
  );
  const value = useMemo(() => show, [show]);

  return (
    <ToastContext.Provider value={value}>
      {children}
      <div aria-live="polite" className={placement}>
        {toasts.map((t) => (
          <div
            key={t.id}
            className={clsx(
              'pointer-events-auto flex w-full max-w-sm items-start gap-3 rounded-md px-4 py-3 text-base shadow-pop',
              t.tone === 'success' ? 'bg-ink-900 text-white' : 'bg-danger-700 text-white',
            )}
          >
            {t.tone === 'success' ? (
              <CircleCheck className="mt-0.5 h-5 w-5 shrink-0 text-amber-300" aria-hidden="true" />
            ) : (
              <CircleAlert className="mt-0.5 h-5 w-5 shrink-0" aria-hidden="true" />
            )}
            <p className="flex-1">{t.message}</p>
            <button
              type="button"
              onClick={() => dismiss(t.id)}
              aria-label="Dismiss"
              className="-m-1 rounded p-1 opacity-80 hover:opacity-100"
            >
              <X className="h-4 w-4" aria-hidden="true" />
            </button>
          </div>
        ))}
      </div>
    </ToastContext.Provider>
  );
}

export function useToast() {
  const show = useContext(ToastContext);
  if (!show) throw new Error('useToast() needs <ToastProvider> above it.');
  return show;
}

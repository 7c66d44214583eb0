import clsx from 'clsx';
import { CircleAlert, CircleCheck, Info } from 'lucide-react';
import type { ReactNode } from 'react';

type Tone = 'danger' | 'success' | 'info';

const tones: Record<Tone, { box: string; icon: typeof Info }> = {
  danger: { box: 'border-danger-600/40 bg-danger-50 text-danger-700', icon: CircleAlert },
  success: { box: 'border-state-on-track/30 bg-state-on-track-bg text-state-on-track', icon: CircleCheck },
  info: { box: 'border-ink-200 bg-ink-50 text-ink-800', icon: Info },
};

interface AlertProps {
  tone?: Tone;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Danger alerts are announced at once (role=alert); others politely (role=status). */
  live?: boolean;
}

export function Alert({ tone = 'info', title, children, className, live = true }: AlertProps) {
  const { box, icon: Icon } = tones[tone];
  return (
    <div
      role={live ? (tone === 'danger' ? 'alert' : 'status') : undefined}
      className={clsx('flex gap-3 rounded border px-3.5 py-3 text-base', box, className)}
    >
      <Icon className="mt-0.5 h-5 w-5 shrink-0" aria-hidden="true" />
      <div className="min-w-0 space-y-1">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className="text-stone-800">{children}</div> : null}
      </div>
    </div>
  );
}

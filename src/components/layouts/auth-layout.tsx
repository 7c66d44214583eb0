import type { ReactNode } from 'react';
import { Logo } from '@/components/ui/logo';

interface AuthLayoutProps {
  title: ReactNode;
  description?: ReactNode;
  children: ReactNode;
}

/** Sign-in, forgot password and set password: a quiet card beside the product's mark. */
export function AuthLayout({ title, description, children }: AuthLayoutProps) {
  return (
    <div className="min-h-dvh bg-stone-50 lg:grid lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
      <aside className="on-ink relative overflow-hidden bg-ink-900 px-6 py-6 lg:flex lg:flex-col lg:justify-between lg:px-12 lg:py-12">
        <GridPattern />
        <div className="relative">
          <Logo />
        </div>
        <div className="relative hidden max-w-md lg:block">
          <p className="text-3xl font-semibold leading-tight text-white">
            Every wall you installed, every cabinet in it, and what is due next.
          </p>
          <p className="mt-4 text-base text-ink-200">
            The service desk and installed-base register for the people who install, repair and look after LED video walls.
          </p>
        </div>
        <p className="relative hidden text-sm text-ink-300 lg:block">Isolate power before opening a cabinet.</p>
      </aside>
      <main className="flex items-start justify-center px-4 py-10 sm:py-16 lg:items-center">
        <div className="w-full max-w-form">
          <h1 className="text-2xl font-semibold">{title}</h1>
          {description ? <div className="mt-2 text-base text-stone-600">{description}</div> : null}
          <div className="mt-8">{children}</div>
        </div>
      </main>
    </div>
  );
}

/** A faint grid of cabinets with a few picked out in amber: the product's motif. */
function GridPattern() {
  const cell = 28;
  const cols = 24;
  const rows = 36;
  const lit = new Set(['17-3', '18-3', '4-9', '20-14', '9-22', '15-27']);
  return (
    <svg
      className="pointer-events-none absolute inset-0 h-full w-full"
      viewBox={`0 0 ${cols * cell} ${rows * cell}`}
      preserveAspectRatio="xMinYMin slice"
      aria-hidden="true"
    >
      {Array.from({ length: rows }).flatMap((_, r) =>
        Array.from({ length: cols }).map((__, c) => {
          const on = lit.has(`${c}-${r}`);
          return (
            <rect
              key={`${c}-${r}`}
              x={c * cell + 2}
              y={r * cell + 2}
              width={cell - 4}
              height={cell - 4}
              rx="2"
              fill={on ? '#f4a62a' : '#1c3d44'}
              fillOpacity={on ? 0.6 : 0.55}
            />
          );
        }),
      )}
    </svg>
  );
}

import clsx from 'clsx';
import { useEffect, useId, useRef, useState, type ReactNode, type RefObject } from 'react';

interface PopoverProps {
  /** Renders the button that opens the panel; spread the props onto a <button>. */
  trigger: (props: {
    'aria-expanded': boolean;
    'aria-controls': string;
    onClick: () => void;
    ref: RefObject<HTMLButtonElement | null>;
  }) => ReactNode;
  children: ReactNode | ((close: () => void) => ReactNode);
  align?: 'left' | 'right';
  /** Names the panel for assistive technology (and tests): it becomes a labelled group. */
  label?: string;
  /** Open upwards (for a trigger near the bottom of the screen). */
  side?: 'bottom' | 'top';
  className?: string;
}

/**
 * A disclosure panel (a button that shows and hides a small panel). Closes on Escape, on a click
 * outside, and after a choice; focus goes back to the button.
 */
export function Popover({ trigger, children, align = 'right', label, side = 'bottom', className }: PopoverProps) {
  const [open, setOpen] = useState(false);
  const id = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement | null>(null);

  useEffect(() => {
    if (!open) return;
    const onPointer = (e: PointerEvent) => {
      if (rootRef.current && !rootRef.current.contains(e.target as Node)) setOpen(false);
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') {
        setOpen(false);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  const close = () => {
    setOpen(false);
    buttonRef.current?.focus();
  };

  return (
    <div ref={rootRef} className="relative">
      {trigger({ 'aria-expanded': open, 'aria-controls': id, onClick: () => setOpen((v) => !v), ref: buttonRef })}
      <div
        id={id}
        role={label ? 'group' : undefined}
        aria-label={label}
        hidden={!open}
        className={clsx(
          'absolute z-40 min-w-[12rem] rounded-md border border-stone-200 bg-white p-1 text-stone-900 shadow-pop',
          align === 'right' ? 'right-0' : 'left-0',
          side === 'bottom' ? 'top-full mt-1.5' : 'bottom-full mb-1.5',
          className,
        )}
      >
        {open ? (typeof children === 'function' ? children(close) : children) : null}
      </div>
    </div>
  );
}

/** A full-width row inside a Popover: a button or a link. */
export const popoverItemClasses =
  'flex w-full min-h-touch md:min-h-9 items-center gap-2.5 rounded px-3 text-left text-base text-stone-800 hover:bg-stone-100 hover:text-ink-950';

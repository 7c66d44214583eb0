import { Eraser } from 'lucide-react';
import { useEffect, useRef } from 'react';
import SignaturePad from 'signature_pad';
import { useFormContext } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FieldErrorText, useFieldState } from '@/components/ui/field';

/**
 * The client's signature, drawn with a finger, a stylus or a mouse (signature_pad, pointer
 * events). Its value is the drawing as a PNG data URL, or '' while the pad is empty. The canvas
 * draws at the screen's pixel density and keeps the strokes when the phone turns.
 */
export function SignatureField({ name, label }: { name: string; label: string }) {
  const { setValue, formState } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  const canvas = useRef<HTMLCanvasElement>(null);
  const pad = useRef<SignaturePad | null>(null);
  const validate = useRef(false);

  useEffect(() => {
    validate.current = formState.isSubmitted;
  }, [formState.isSubmitted]);

  useEffect(() => {
    const el = canvas.current;
    if (!el) return;
    const p = new SignaturePad(el, { penColor: '#0b1324', minWidth: 1.2, maxWidth: 3.2 });
    pad.current = p;
    // A fresh pad is empty: a drawing from before it was hidden is not signed any more.
    setValue(name, '');
    const fit = () => {
      const ratio = Math.max(window.devicePixelRatio || 1, 1);
      const strokes = p.toData();
      el.width = el.offsetWidth * ratio;
      el.height = el.offsetHeight * ratio;
      el.getContext('2d')?.scale(ratio, ratio);
      p.clear();
      p.fromData(strokes);
    };
    fit();
    const resize = new ResizeObserver(fit);
    resize.observe(el);
    const drawn = () =>
      setValue(name, p.isEmpty() ? '' : p.toDataURL('image/png'), { shouldDirty: true, shouldValidate: validate.current });
    p.addEventListener('endStroke', drawn);
    return () => {
      resize.disconnect();
      p.removeEventListener('endStroke', drawn);
      p.off();
      pad.current = null;
    };
  }, [name, setValue]);

  const clear = () => {
    pad.current?.clear();
    setValue(name, '', { shouldDirty: true, shouldValidate: validate.current });
  };

  return (
    <div className="space-y-1.5">
      <div className="flex items-end justify-between gap-3">
        <label htmlFor={id} className="text-sm font-medium text-stone-800">
          {label}
        </label>
        <Button size="md" variant="ghost" onClick={clear} icon={<Eraser className="h-4 w-4" aria-hidden="true" />}>
          Clear
        </Button>
      </div>
      <div className={`relative rounded-md border-2 bg-white ${error ? 'border-danger-600' : 'border-stone-400'}`}>
        <canvas
          id={id}
          ref={canvas}
          role="img"
          aria-label={`${label}: drawing area`}
          aria-describedby={error ? errorId : hintId}
          aria-invalid={error ? true : undefined}
          data-testid="signature-pad"
          className="block h-56 w-full touch-none rounded-md"
        />
        <div aria-hidden="true" className="pointer-events-none absolute inset-x-6 bottom-10 border-b border-dashed border-stone-300" />
      </div>
      {error ? (
        <FieldErrorText id={errorId} message={error} />
      ) : (
        <p id={hintId} className="text-sm text-stone-600">
          Sign inside the box with a finger. Clear starts again.
        </p>
      )}
    </div>
  );
}

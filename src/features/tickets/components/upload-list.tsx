import clsx from 'clsx';
import { Camera, CircleAlert, CircleCheck, FileVideo, ImagePlus, RotateCcw, X } from 'lucide-react';
import { useId, type ChangeEvent } from 'react';
import { buttonClasses } from '@/components/ui/button';
import type { QueuedFile } from '@/features/tickets/components/use-upload-queue';

const sizeText = (bytes: number) =>
  bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;

/**
 * Two ways to add photos or a short video: straight from the camera (on a phone) or from the
 * files already there. The camera input uses `capture`, which some phones treat as "camera
 * only", hence the second input without it.
 */
export function MediaPicker({ onFiles, disabled }: { onFiles: (files: File[]) => void; disabled?: boolean }) {
  const cameraId = useId();
  const filesId = useId();
  const take = (e: ChangeEvent<HTMLInputElement>) => {
    const files = e.target.files ? [...e.target.files] : [];
    e.target.value = ''; // the same file can be chosen again after removing it
    if (files.length) onFiles(files);
  };
  return (
    <div className="flex flex-wrap gap-2">
      <label
        htmlFor={cameraId}
        className={clsx(
          buttonClasses('secondary', 'md'),
          'cursor-pointer [@media(pointer:fine)]:hidden',
          disabled && 'pointer-events-none opacity-60',
        )}
      >
        <Camera className="h-4 w-4" aria-hidden="true" />
        Take a photo or video
        <input
          id={cameraId}
          type="file"
          accept="image/*,video/*"
          capture="environment"
          multiple
          className="sr-only"
          onChange={take}
          disabled={disabled}
        />
      </label>
      <label
        htmlFor={filesId}
        className={clsx(buttonClasses('secondary', 'md'), 'cursor-pointer', disabled && 'pointer-events-none opacity-60')}
      >
        <ImagePlus className="h-4 w-4" aria-hidden="true" />
        Add photos or a video
        <input id={filesId} type="file" accept="image/*,video/*" multiple className="sr-only" onChange={take} disabled={disabled} />
      </label>
    </div>
  );
}

interface UploadListProps {
  items: QueuedFile[];
  onRemove?: (key: string) => void;
  onRetry?: (key: string) => void;
}

/** Chosen files with a preview, and a progress bar each while they upload. */
export function UploadList({ items, onRemove, onRetry }: UploadListProps) {
  if (items.length === 0) return null;
  return (
    <ul className="space-y-2" aria-label="Photos and videos to send">
      {items.map((item) => {
        const percent = Math.round(item.progress * 100);
        return (
          <li
            key={item.key}
            className={clsx(
              'flex items-center gap-3 rounded-md border bg-white p-2 pr-3',
              item.status === 'failed' ? 'border-danger-600/40' : 'border-stone-200',
            )}
          >
            <span className="flex h-14 w-14 shrink-0 items-center justify-center overflow-hidden rounded bg-stone-100 text-stone-500">
              {item.preview ? (
                <img src={item.preview} alt="" className="h-full w-full object-cover" />
              ) : (
                <FileVideo className="h-6 w-6" aria-hidden="true" />
              )}
            </span>
            <div className="min-w-0 flex-1 space-y-1">
              <p className="flex items-baseline justify-between gap-2 text-sm">
                <span className="truncate font-medium text-ink-950">{item.file.name}</span>
                <span className="shrink-0 text-xs text-stone-600">{sizeText(item.file.size)}</span>
              </p>
              {item.status === 'failed' ? (
                <p className="flex items-start gap-1 text-sm text-danger-700">
                  <CircleAlert className="mt-0.5 h-4 w-4 shrink-0" aria-hidden="true" />
                  {item.error ?? 'Could not be sent.'}
                </p>
              ) : (
                <>
                  <div
                    role="progressbar"
                    aria-label={`Upload of ${item.file.name}`}
                    aria-valuemin={0}
                    aria-valuemax={100}
                    aria-valuenow={percent}
                    className="h-2 overflow-hidden rounded-full bg-stone-200"
                  >
                    <div
                      className={clsx(
                        'h-full rounded-full transition-[width] duration-200',
                        item.status === 'done' ? 'bg-state-on-track-dot' : 'bg-amber-500',
                      )}
                      style={{ width: `${item.status === 'waiting' ? 0 : percent}%` }}
                    />
                  </div>
                  <p className="flex items-center gap-1 text-xs text-stone-600">
                    {item.status === 'done' ? (
                      <>
                        <CircleCheck className="h-3.5 w-3.5 text-state-on-track" aria-hidden="true" /> Sent
                      </>
                    ) : item.status === 'uploading' ? (
                      `Sending… ${percent} %`
                    ) : (
                      'Ready to send'
                    )}
                  </p>
                </>
              )}
            </div>
            {item.status === 'failed' && onRetry ? (
              <button
                type="button"
                onClick={() => onRetry(item.key)}
                aria-label={`Try ${item.file.name} again`}
                title="Try again"
                className="flex h-touch w-touch items-center justify-center rounded text-ink-700 hover:bg-ink-50 md:h-9 md:w-9"
              >
                <RotateCcw className="h-4 w-4" aria-hidden="true" />
              </button>
            ) : null}
            {onRemove && item.status !== 'uploading' && item.status !== 'done' ? (
              <button
                type="button"
                onClick={() => onRemove(item.key)}
                aria-label={`Remove ${item.file.name}`}
                title="Remove"
                className="flex h-touch w-touch items-center justify-center rounded text-stone-500 hover:bg-stone-100 hover:text-ink-900 md:h-9 md:w-9"
              >
                <X className="h-4 w-4" aria-hidden="true" />
              </button>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}

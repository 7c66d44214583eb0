import { Camera, X } from 'lucide-react';
import { useEffect, useId, useMemo } from 'react';
import { buttonClasses } from '@/components/ui/button';
import { newIdempotencyKey, type OutboxPhoto } from '@/lib/offline-queue';

/** Object URLs for the thumbnails, released when the photos change or the form closes. */
function usePreviews(photos: OutboxPhoto[]) {
  const urls = useMemo(() => photos.map((p) => ({ id: p.id, url: URL.createObjectURL(p.blob) })), [photos]);
  useEffect(() => () => urls.forEach((u) => URL.revokeObjectURL(u.url)), [urls]);
  return urls;
}

/**
 * Photos from the phone's camera (`capture="environment"` opens the back camera; a desktop
 * browser offers a file instead). They are kept with the draft, on the phone, until sent.
 */
export function PhotoPicker({ photos, onChange }: { photos: OutboxPhoto[]; onChange: (photos: OutboxPhoto[]) => void }) {
  const inputId = useId();
  const previews = usePreviews(photos);
  return (
    <div className="space-y-3">
      <label htmlFor={inputId} className={buttonClasses('secondary', 'lg', 'w-full cursor-pointer')}>
        <Camera className="h-5 w-5" aria-hidden="true" />
        {photos.length ? 'Take another photo' : 'Take a photo'}
      </label>
      <input
        id={inputId}
        type="file"
        accept="image/*"
        capture="environment"
        multiple
        className="sr-only"
        onChange={(e) => {
          const files = Array.from(e.target.files ?? []);
          e.target.value = '';
          if (!files.length) return;
          const added = files.map((f) => ({
            id: newIdempotencyKey(),
            name: f.name || 'photo.jpg',
            type: f.type,
            // A plain Blob keeps in IndexedDB on every browser.
            blob: f.slice(0, f.size, f.type),
          }));
          onChange([...photos, ...added]);
        }}
      />
      {photos.length ? (
        <ul className="grid grid-cols-3 gap-2" aria-label="Photos of the repair">
          {photos.map((p) => (
            <li key={p.id} className="relative">
              <img
                src={previews.find((u) => u.id === p.id)?.url}
                alt={p.name}
                className="aspect-square w-full rounded-md border border-stone-200 object-cover"
              />
              <button
                type="button"
                onClick={() => onChange(photos.filter((x) => x.id !== p.id))}
                aria-label={`Remove ${p.name}`}
                className="absolute right-1 top-1 flex h-touch w-touch items-center justify-center rounded-full bg-ink-950/75 text-white"
              >
                <X className="h-5 w-5" aria-hidden="true" />
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

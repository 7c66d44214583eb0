import { KeyRound } from 'lucide-react';

/**
 * The access notes, shown first and large: the technician reads them in the van (loading dock,
 * keys, parking, service-entry hours).
 */
export function SiteAccessNotes({ notes }: { notes: string }) {
  return (
    <section aria-labelledby="access-notes-title" className="rounded-md border border-amber-300 bg-amber-50 px-4 py-4 shadow-card sm:px-5">
      <h2 id="access-notes-title" className="flex items-center gap-2 text-base font-semibold text-amber-900">
        <KeyRound className="h-5 w-5 text-amber-700" aria-hidden="true" />
        Access notes
      </h2>
      {notes.trim() ? (
        <p className="mt-2 whitespace-pre-line text-md leading-relaxed text-stone-900">{notes}</p>
      ) : (
        <p className="mt-2 text-stone-700">No access notes yet. Ask the client how to get in, and write it down here for the next visit.</p>
      )}
    </section>
  );
}

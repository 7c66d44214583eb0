import type { Attachment } from '@shared/schemas/attachments';
import { useQuery } from '@tanstack/react-query';
import { Download, FileText, Lock, Paperclip, PlayCircle } from 'lucide-react';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { buttonClasses } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Spinner } from '@/components/ui/spinner';
import { TicketPanel } from '@/features/tickets/components/ticket-panel';
import { MediaPicker, UploadList } from '@/features/tickets/components/upload-list';
import { useUploadQueue } from '@/features/tickets/components/use-upload-queue';
import { errorMessage } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { attachmentQueries, downloadUrl, inlineUrl } from '@/resources/attachments';
import { TruncatedNote } from '@/components/ui/truncated-note';

const sizeText = (bytes: number) =>
  bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;

/** Photos, videos and files of a ticket: thumbnails, a larger view, downloads, and adding more. */
export function AttachmentsPanel({ ticketId, canUpload }: { ticketId: string; canUpload: boolean }) {
  const attachments = useQuery(attachmentQueries.ofTicket(ticketId));
  const uploads = useUploadQueue();
  const [viewing, setViewing] = useState<Attachment | null>(null);
  const items = attachments.data?.items ?? [];

  const onFiles = async (files: File[]) => {
    await uploads.sendAll(ticketId, uploads.add(files));
    setTimeout(uploads.clearDone, 1500);
  };

  return (
    <TicketPanel title="Photos and files" icon={Paperclip}>
      <div className="space-y-4">
        {attachments.isPending ? (
          <p className="flex items-center gap-2 text-sm text-stone-600">
            <Spinner label="" /> Loading…
          </p>
        ) : attachments.isError ? (
          <Alert tone="danger">{errorMessage(attachments.error)}</Alert>
        ) : items.length === 0 ? (
          <p className="text-sm text-stone-600">No photos or files yet.</p>
        ) : (
          <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4" aria-label="Attachments">
            {items.map((a) => (
              <AttachmentTile key={a.id} attachment={a} onView={setViewing} />
            ))}
          </ul>
        )}
        <TruncatedNote truncated={attachments.data?.truncated}>
          The newest {items.length} files are shown; older ones are kept.
        </TruncatedNote>

        {canUpload ? (
          <div className="space-y-3 border-t border-stone-100 pt-4">
            <MediaPicker onFiles={onFiles} disabled={uploads.busy} />
            <UploadList
              items={uploads.items}
              onRemove={uploads.remove}
              onRetry={(key) => uploads.retry(ticketId, key).then(() => undefined)}
            />
          </div>
        ) : null}
      </div>

      <AttachmentViewer attachment={viewing} onClose={() => setViewing(null)} />
    </TicketPanel>
  );
}

/** One file: a thumbnail (photos and videos open larger), its name, size and uploader, and a download. */
function AttachmentTile({ attachment: a, onView }: { attachment: Attachment; onView: (a: Attachment) => void }) {
  return (
    <li className="overflow-hidden rounded-md border border-stone-200 bg-white">
      {a.kind === 'photo' || a.kind === 'video' ? (
        <button
          type="button"
          onClick={() => onView(a)}
          className="relative block aspect-[4/3] w-full bg-stone-100"
          aria-label={`View ${a.fileName}`}
        >
          {a.kind === 'photo' ? (
            <img src={inlineUrl(a)} alt={a.fileName} loading="lazy" className="h-full w-full object-cover" />
          ) : (
            <span className="flex h-full w-full items-center justify-center text-ink-700">
              <PlayCircle className="h-10 w-10" aria-hidden="true" />
            </span>
          )}
        </button>
      ) : (
        <span className="flex aspect-[4/3] w-full items-center justify-center bg-stone-100 text-stone-500">
          <FileText className="h-10 w-10" aria-hidden="true" />
        </span>
      )}
      <div className="flex items-start gap-1 p-2">
        <div className="min-w-0 flex-1">
          <p className="truncate text-sm font-medium text-ink-950" title={a.fileName}>
            {a.fileName}
          </p>
          <p className="truncate text-xs text-stone-600" title={formatDateTime(a.createdAt)}>
            {sizeText(a.sizeBytes)}
            {a.uploadedByName ? ` · ${a.uploadedByName}` : ''}
          </p>
          {a.internal ? (
            <p className="mt-0.5 inline-flex items-center gap-1 text-xs font-medium text-stone-700">
              <Lock className="h-3 w-3" aria-hidden="true" /> Staff only
            </p>
          ) : null}
        </div>
        <a
          href={downloadUrl(a)}
          download={a.fileName}
          className="flex h-touch w-touch shrink-0 items-center justify-center rounded text-ink-700 hover:bg-ink-50 md:h-8 md:w-8"
          aria-label={`Download ${a.fileName}`}
          title="Download"
        >
          <Download className="h-4 w-4" aria-hidden="true" />
        </a>
      </div>
    </li>
  );
}

/** A photo or video shown large, with a download. */
function AttachmentViewer({ attachment: viewing, onClose }: { attachment: Attachment | null; onClose: () => void }) {
  return (
    <Dialog open={viewing !== null} onClose={onClose} title={viewing?.fileName ?? ''} size="lg">
      {viewing ? (
        <div className="space-y-3">
          {viewing.kind === 'video' ? (
            <video src={inlineUrl(viewing)} controls playsInline className="max-h-[65dvh] w-full rounded bg-black" />
          ) : (
            <img src={inlineUrl(viewing)} alt={viewing.fileName} className="max-h-[65dvh] w-full rounded object-contain" />
          )}
          <div className="flex justify-end">
            <a href={downloadUrl(viewing)} download={viewing.fileName} className={buttonClasses('secondary', 'md')}>
              <Download className="h-4 w-4" aria-hidden="true" />
              Download
            </a>
          </div>
        </div>
      ) : null}
    </Dialog>
  );
}

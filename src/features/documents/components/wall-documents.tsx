import type { Attachment } from '@shared/schemas/attachments';
import { useQuery } from '@tanstack/react-query';
import { Download, FileText, Image as ImageIcon, Trash2, Upload } from 'lucide-react';
import { useId, useRef, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { Spinner } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { useDeleteDocument, useUploadWallDocument } from '@/features/documents/api/mutations';
import { errorMessage } from '@/lib/errors';
import { formatDateTime } from '@/lib/format';
import { attachmentQueries } from '@/resources/attachments';
import { TruncatedNote } from '@/components/ui/truncated-note';

export function fileSize(bytes: number) {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

interface WallDocumentsProps {
  wallId: string;
  /** Staff upload (technicians too: photos of the as-built, controller exports). */
  canUpload: boolean;
  /** Staff may mark a file internal (never shown to the client). */
  canMarkInternal: boolean;
  /** The office removes files. */
  canDelete: boolean;
}

/** As-built drawings, controller configuration files and calibration reports of a wall. */
export function WallDocuments({ wallId, canUpload, canMarkInternal, canDelete }: WallDocumentsProps) {
  const query = useQuery(attachmentQueries.ofWall(wallId));
  const remove = useDeleteDocument();
  const toast = useToast();
  const [removing, setRemoving] = useState<Attachment | null>(null);
  const files = query.data?.items ?? [];

  return (
    <div className="space-y-5">
      {canUpload ? <UploadForm wallId={wallId} canMarkInternal={canMarkInternal} /> : null}
      <Card title="Documents" description="As-built drawings, controller configuration files, calibration reports." flush>
        <TruncatedNote truncated={query.data?.truncated} className="m-4">
          The newest {files.length} documents are shown; older ones are kept.
        </TruncatedNote>
        {query.isPending ? (
          <p className="px-5 py-8 text-center text-stone-600">
            <Spinner className="mr-2" label="" /> Loading…
          </p>
        ) : query.isError ? (
          <div className="p-4">
            <Alert tone="danger" title="The documents could not be loaded.">
              {errorMessage(query.error)}
            </Alert>
          </div>
        ) : files.length === 0 ? (
          <EmptyState
            icon={FileText}
            title="No documents yet"
            description={canUpload ? 'Upload the as-built drawing first: the next technician will thank you.' : undefined}
          />
        ) : (
          <ul className="divide-y divide-stone-100">
            {files.map((f) => (
              <DocumentRow key={f.id} file={f} onRemove={canDelete ? setRemoving : undefined} />
            ))}
          </ul>
        )}
      </Card>
      <ConfirmDialog
        open={removing !== null}
        onClose={() => setRemoving(null)}
        title={`Remove ${removing?.fileName ?? 'this file'}?`}
        confirmLabel="Remove file"
        tone="danger"
        onConfirm={async () => {
          if (!removing) return;
          await remove.mutateAsync(removing.id);
          toast(`${removing.fileName} is removed.`);
        }}
      >
        <p>The file is deleted from storage. This cannot be undone.</p>
      </ConfirmDialog>
    </div>
  );
}

interface DocumentRowProps {
  file: Attachment;
  /** The office removes files; leave out for everyone else. */
  onRemove?: (file: Attachment) => void;
}

/** One document: its name (a download), size, date and uploader, and View, Download and Remove. */
function DocumentRow({ file: f, onRemove }: DocumentRowProps) {
  const Icon = f.kind === 'photo' ? ImageIcon : FileText;
  return (
    <li className="flex flex-wrap items-center justify-between gap-3 px-4 py-3 sm:px-5">
      <div className="flex min-w-0 items-start gap-3">
        <Icon className="mt-0.5 h-5 w-5 shrink-0 text-ink-500" aria-hidden="true" />
        <div className="min-w-0">
          <a href={f.url} className="link break-all" download={f.fileName}>
            {f.fileName}
          </a>
          <p className="text-sm text-stone-600">
            {fileSize(f.sizeBytes)} · {formatDateTime(f.createdAt)}
            {f.uploadedByName ? ` · ${f.uploadedByName}` : ''}
          </p>
        </div>
        {f.internal ? <Badge tone="amber">Internal</Badge> : null}
      </div>
      <div className="flex gap-1">
        {/^image\/|^application\/pdf$/.test(f.contentType) ? (
          <a
            href={`${f.url}?inline=1`}
            target="_blank"
            rel="noreferrer"
            className="rounded px-2.5 py-1.5 text-sm font-medium text-ink-700 hover:bg-ink-50"
          >
            View
          </a>
        ) : null}
        <a
          href={f.url}
          download={f.fileName}
          className="inline-flex items-center gap-1.5 rounded px-2.5 py-1.5 text-sm font-medium text-ink-700 hover:bg-ink-50"
        >
          <Download className="h-4 w-4" aria-hidden="true" /> Download
        </a>
        {onRemove ? (
          <Button
            size="sm"
            variant="ghost"
            aria-label={`Remove ${f.fileName}`}
            onClick={() => onRemove(f)}
            icon={<Trash2 className="h-4 w-4" aria-hidden="true" />}
          >
            Remove
          </Button>
        ) : null}
      </div>
    </li>
  );
}

function UploadForm({ wallId, canMarkInternal }: { wallId: string; canMarkInternal: boolean }) {
  const fileId = useId();
  const internalId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [internal, setInternal] = useState(false);
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<unknown>(null);
  const upload = useUploadWallDocument();
  const toast = useToast();

  return (
    <Card title="Upload a document">
      <form
        className="space-y-4"
        onSubmit={async (e) => {
          e.preventDefault();
          if (!file) return;
          setError(null);
          setProgress(0);
          try {
            const stored = await upload.mutateAsync({ wallId, file, internal: canMarkInternal && internal, onProgress: setProgress });
            toast(`${stored.fileName} is uploaded.`);
            setFile(null);
            setInternal(false);
            if (inputRef.current) inputRef.current.value = '';
          } catch (err) {
            setError(err);
          } finally {
            setProgress(null);
          }
        }}
      >
        {error ? <Alert tone="danger">{errorMessage(error)}</Alert> : null}
        <div className="space-y-1.5">
          <label htmlFor={fileId} className="text-sm font-medium text-stone-800">
            File
          </label>
          <input
            ref={inputRef}
            id={fileId}
            type="file"
            accept=".pdf,.png,.jpg,.jpeg,.webp,.zip,.txt,.csv,.json,.xml,.cfg,.ini"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              setError(null);
            }}
            className="block w-full text-base text-stone-800 file:mr-3 file:min-h-touch file:cursor-pointer file:rounded file:border file:border-stone-300 file:bg-white file:px-4 file:text-base file:font-medium file:text-ink-900 hover:file:bg-stone-50 md:file:min-h-10"
          />
          <p className="text-sm text-stone-600">PDF, images (PNG, JPEG, WebP), ZIP or plain-text exports.</p>
        </div>
        {canMarkInternal ? (
          <label htmlFor={internalId} className="flex min-h-touch cursor-pointer items-start gap-3 md:min-h-0">
            <input
              id={internalId}
              type="checkbox"
              checked={internal}
              onChange={(e) => setInternal(e.target.checked)}
              className="mt-0.5 h-5 w-5 shrink-0 accent-ink-700"
            />
            <span>
              <span className="text-base text-stone-900">Internal</span>
              <span className="block text-sm text-stone-600">Only staff see it; the client's people do not.</span>
            </span>
          </label>
        ) : null}
        <div className="flex flex-wrap items-center gap-3">
          <Button
            type="submit"
            variant="primary"
            disabled={!file}
            loading={progress !== null}
            icon={<Upload className="h-4 w-4" aria-hidden="true" />}
          >
            Upload
          </Button>
          {progress !== null ? <UploadProgress fraction={progress} /> : null}
        </div>
      </form>
    </Card>
  );
}

/** How much of the file has gone (0..1), as a bar and a percentage. */
function UploadProgress({ fraction }: { fraction: number }) {
  return (
    <div className="flex min-w-[12rem] flex-1 items-center gap-3">
      <div
        role="progressbar"
        aria-label="Uploading"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(fraction * 100)}
        className="h-2.5 flex-1 overflow-hidden rounded-full bg-stone-200"
      >
        <div className="h-full rounded-full bg-ink-600 transition-[width]" style={{ width: `${Math.round(fraction * 100)}%` }} />
      </div>
      <span className="w-12 text-right text-sm tabular-nums text-stone-700">{Math.round(fraction * 100)} %</span>
    </div>
  );
}

import { useCallback, useEffect, useRef, useState } from 'react';
import { useUploadTicketAttachment } from '@/features/tickets/api/mutations';
import { errorMessage } from '@/lib/errors';

export type UploadStatus = 'waiting' | 'uploading' | 'done' | 'failed';

export interface QueuedFile {
  key: string;
  file: File;
  /** 0..1 */
  progress: number;
  status: UploadStatus;
  error?: string;
  /** An object URL for an image preview. */
  preview?: string;
}

/** The upload limit the server applies by default (UPLOAD_MAX_BYTES, 25 MB). */
export const maxUploadBytes = 25 * 1024 * 1024;

/** Why a file cannot be sent, before sending it; null when it may go. */
export function refuseFile(file: File): string | null {
  if (file.type && !/^(image|video)\//.test(file.type)) return 'Only photos and videos can be added here.';
  if (file.size > maxUploadBytes)
    return `Larger than ${Math.round(maxUploadBytes / 1024 / 1024)} MB: trim the video or send a shorter one.`;
  return null;
}

let nextKey = 1;

/**
 * Photos and videos waiting to go to a ticket, each with its own progress. Files go one at a
 * time (kinder to a phone's connection); a failed one can be tried again.
 */
export function useUploadQueue() {
  const { mutateAsync: upload } = useUploadTicketAttachment();
  const [items, setItems] = useState<QueuedFile[]>([]);
  const itemsRef = useRef(items);
  itemsRef.current = items;

  // Free the previews when the page goes.
  useEffect(
    () => () => {
      for (const item of itemsRef.current) if (item.preview) URL.revokeObjectURL(item.preview);
    },
    [],
  );

  const patch = useCallback((key: string, change: Partial<QueuedFile>) => {
    setItems((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i)));
  }, []);

  const add = useCallback((files: Iterable<File>) => {
    const added: QueuedFile[] = [];
    for (const file of files) {
      const refused = refuseFile(file);
      added.push({
        key: `f${nextKey++}`,
        file,
        progress: 0,
        status: refused ? 'failed' : 'waiting',
        error: refused ?? undefined,
        preview: file.type.startsWith('image/') ? URL.createObjectURL(file) : undefined,
      });
    }
    setItems((all) => [...all, ...added]);
    return added;
  }, []);

  const remove = useCallback((key: string) => {
    setItems((all) => {
      const gone = all.find((i) => i.key === key);
      if (gone?.preview) URL.revokeObjectURL(gone.preview);
      return all.filter((i) => i.key !== key);
    });
  }, []);

  const sendOne = useCallback(
    async (ticketId: string, item: QueuedFile) => {
      patch(item.key, { status: 'uploading', progress: 0, error: undefined });
      try {
        await upload({ ticketId, file: item.file, onProgress: (progress) => patch(item.key, { progress }) });
        patch(item.key, { status: 'done', progress: 1 });
        return true;
      } catch (error) {
        patch(item.key, { status: 'failed', error: errorMessage(error) });
        return false;
      }
    },
    [patch, upload],
  );

  /** Sends every waiting file (or only those given); resolves to the number that failed. */
  const sendAll = useCallback(
    async (ticketId: string, only?: QueuedFile[]) => {
      const queued = only ?? itemsRef.current;
      let failed = queued.filter((i) => i.status === 'failed').length;
      for (const item of queued.filter((i) => i.status === 'waiting')) {
        if (!(await sendOne(ticketId, item))) failed += 1;
      }
      return failed;
    },
    [sendOne],
  );

  const retry = useCallback(
    (ticketId: string, key: string) => {
      const item = itemsRef.current.find((i) => i.key === key);
      if (item && !refuseFile(item.file)) return sendOne(ticketId, item);
      return Promise.resolve(false);
    },
    [sendOne],
  );

  /** Forget the files that went through (after they show in the ticket's list). */
  const clearDone = useCallback(() => {
    setItems((all) => {
      for (const i of all) if (i.status === 'done' && i.preview) URL.revokeObjectURL(i.preview);
      return all.filter((i) => i.status !== 'done');
    });
  }, []);

  return { items, add, remove, sendAll, retry, clearDone, busy: items.some((i) => i.status === 'uploading') };
}

export type UploadQueue = ReturnType<typeof useUploadQueue>;

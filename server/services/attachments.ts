import { fileTypeFromBuffer } from 'file-type';
import { and, desc, eq, or, type SQL } from 'drizzle-orm';
import type { Attachment } from '../../shared/schemas/attachments.js';
import type { AttachmentKind } from '../../shared/schemas/enums.js';
import { db } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { attachments } from '../db/schema/files.js';
import { AppError } from '../errors.js';
import { deleteObject, getObjectStream, newStorageKey, putObject } from '../integrations/s3.js';
import { logger } from '../logger.js';
import type { Actor } from '../middleware/auth.js';
import type { CappedList } from '../../shared/schemas/common.js';
import { recordAudit } from './audit.js';
import { capped } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';

/** What each purpose accepts, by the type found in the content (OWASP File Upload Cheat Sheet). */
const accepted: Record<'document' | 'media', Record<string, AttachmentKind>> = {
  document: {
    'application/pdf': 'document',
    'image/png': 'photo',
    'image/jpeg': 'photo',
    'image/webp': 'photo',
    'application/zip': 'document',
    'text/plain': 'document',
  },
  media: {
    'image/png': 'photo',
    'image/jpeg': 'photo',
    'image/webp': 'photo',
    'image/heic': 'photo',
    'video/mp4': 'video',
    'video/quicktime': 'video',
    'video/webm': 'video',
  },
};

/**
 * The type of a file from its bytes. Text has no magic number: a file that decodes as UTF-8 and
 * holds no control characters but tab, CR and LF counts as text/plain (controller configuration
 * exports, CSV, notes).
 */
export async function sniffType(buffer: Buffer): Promise<string | null> {
  const found_ = await fileTypeFromBuffer(buffer);
  if (found_) return found_.mime;
  const sample = buffer.subarray(0, 64 * 1024);
  const textDecoder = new TextDecoder('utf-8', { fatal: true });
  try {
    const text = textDecoder.decode(
      sample.length < buffer.length ? sample.subarray(0, sample.lastIndexOf(0x0a) + 1 || sample.length) : sample,
    );
    return hasControlCharacters(text) ? null : 'text/plain';
  } catch {
    return null;
  }
}

/** A file name safe to show and to put in Content-Disposition: no path, no control characters. */
export function cleanFileName(name: string) {
  const base = name.split(/[\\/]/).pop() ?? 'file';
  const kept = Array.from(base).filter((char) => !isAsciiControl(char.charCodeAt(0)) && char !== '"');
  const clean = kept.join('').trim().slice(0, 200);
  return clean || 'file';
}

/** U+0000–U+001F and U+007F. */
function isAsciiControl(code: number): boolean {
  return code < 0x20 || code === 0x7f;
}

/** Whether text holds a control character a text file does not: any but tab, line feed and carriage return. */
function hasControlCharacters(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (isAsciiControl(code) && code !== 0x09 && code !== 0x0a && code !== 0x0d) return true;
  }
  return false;
}

export interface Owner {
  wallId?: string;
  ticketId?: string;
  commentId?: string;
  visitId?: string;
  repairId?: string;
}

export interface StoreInput {
  owner: Owner;
  clientId: string | null;
  purpose: 'document' | 'media';
  file: { buffer: Buffer; originalname: string };
  internal?: boolean;
}

/**
 * Checks the content, stores the bytes under a random key, then records the file. If recording
 * fails the stored object is removed again: a failed upload leaves nothing half-made.
 */
export async function storeAttachment(actor: Actor, input: StoreInput, record = db()): Promise<Attachment> {
  const mime = await sniffType(input.file.buffer);
  const kind = mime ? accepted[input.purpose][mime] : undefined;
  if (!mime || !kind) {
    const allowed = Object.keys(accepted[input.purpose]).join(', ');
    throw new AppError(415, 'file_type_not_allowed', `That kind of file cannot be uploaded here. Accepted: ${allowed}.`, {
      file: 'Not an accepted type.',
    });
  }
  const fileName = cleanFileName(input.file.originalname);
  const ownerPrefix =
    Object.entries(input.owner)
      .find(([, v]) => v)
      ?.join('/') ?? 'misc';
  const { key, sizeBytes } = await putObject(newStorageKey(ownerPrefix.replace('Id/', 's/')), input.file.buffer, mime);
  try {
    return await record.transaction(async (tx) => {
      const [row] = await tx
        .insert(attachments)
        .values({
          ...input.owner,
          clientId: input.clientId,
          kind,
          storageKey: key,
          fileName,
          contentType: mime,
          sizeBytes,
          internal: input.internal ?? false,
          uploadedById: actor.userId,
        })
        .returning();
      await recordAudit(tx, {
        actor,
        entity: 'attachment',
        entityId: row.id,
        action: 'uploaded',
        after: { ...input.owner, fileName, contentType: mime, sizeBytes },
      });
      return presentAttachment({ ...row, uploadedByName: actor.name });
    });
  } catch (err) {
    await deleteObject(key).catch((e) => logger.warn('could not remove an orphaned upload', { key, err: e }));
    throw err;
  }
}

export function presentAttachment(a: typeof attachments.$inferSelect & { uploadedByName?: string | null }): Attachment {
  return {
    id: a.id,
    kind: a.kind,
    fileName: a.fileName,
    contentType: a.contentType,
    sizeBytes: a.sizeBytes,
    internal: a.internal,
    uploadedByName: a.uploadedByName ?? null,
    createdAt: a.createdAt.toISOString(),
    url: `/api/attachments/${a.id}`,
  };
}

/** Files a caller may see: their organisation's, and never internal ones for client users. */
function visible(actor: Actor): SQL | undefined {
  if (isStaff(actor)) return undefined;
  return and(tenantWhere(actor, attachments.clientId), eq(attachments.internal, false));
}

/** A record's files, newest first, up to this many (a ticket's photos, a wall's documents). */
export const ATTACHMENTS_CAP = 500;

export async function listAttachments(actor: Actor, owner: Owner): Promise<CappedList<Attachment>> {
  const conditions = Object.entries(owner)
    .filter(([, v]) => v)
    .map(([k, v]) => eq(attachments[k as keyof Owner], v as string));
  const rows = await db()
    .select({ a: attachments, uploadedByName: users.name })
    .from(attachments)
    .leftJoin(users, eq(users.id, attachments.uploadedById))
    .where(and(or(...conditions), visible(actor)))
    .orderBy(desc(attachments.createdAt), desc(attachments.id))
    .limit(ATTACHMENTS_CAP + 1);
  return capped(
    rows.map((r) => presentAttachment({ ...r.a, uploadedByName: r.uploadedByName })),
    ATTACHMENTS_CAP,
  );
}

export async function openAttachment(actor: Actor, id: string) {
  const [row] = await db()
    .select()
    .from(attachments)
    .where(and(eq(attachments.id, id), visible(actor)));
  const a = found(row, 'File');
  return { attachment: a, stream: await getObjectStream(a.storageKey) };
}

export async function deleteAttachment(actor: Actor, id: string) {
  const key = await db().transaction(async (tx) => {
    const [row] = await tx
      .delete(attachments)
      .where(and(eq(attachments.id, id), visible(actor)))
      .returning();
    found(row, 'File');
    await recordAudit(tx, { actor, entity: 'attachment', entityId: id, action: 'deleted', before: row });
    return row.storageKey;
  });
  await deleteObject(key).catch((err) => logger.warn('could not remove a deleted file from storage', { key, err }));
}

/** RFC 6266 / RFC 5987: an ASCII fallback and the UTF-8 name. */
export function contentDisposition(fileName: string, inline: boolean) {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return `${inline ? 'inline' : 'attachment'}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}

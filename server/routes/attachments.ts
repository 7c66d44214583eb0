import { Router, type Request, type RequestHandler } from 'express';
import { z } from 'zod';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles, staffRoles } from '../../shared/schemas/enums.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { singleFile } from '../middleware/upload.js';
import { validated } from '../middleware/validate.js';
import * as files from '../services/attachments.js';
import { visibleWall } from '../services/walls.js';
import { db } from '../db/client.js';

/**
 * The caller's right to the record a file is uploaded to, checked before the multipart body is
 * read: a file for a record the caller may not see is refused (404) without a byte of it held
 * in memory or sent to the object store. A malformed id is left to `validated`, which answers
 * the 400 naming it. The handler checks again (cheaply) inside its own work.
 */
export function mayUploadTo(check: (req: Request, id: string) => Promise<unknown>): RequestHandler {
  return async (req, _res, next) => {
    const parsed = idParams.safeParse(req.params);
    if (parsed.success) await check(req, parsed.data.id);
    next();
  };
}

export const attachmentsRouter = Router();
attachmentsRouter.use(requireAuth);

const downloadQuery = z.object({ inline: z.string().optional() });

/** Downloads with the original name; images and PDFs may be shown inline (`?inline=1`). */
attachmentsRouter.get(
  '/:id',
  validated({ params: idParams, query: downloadQuery }, async ({ params, query }, req, res) => {
    const { attachment, stream } = await files.openAttachment(actorOf(req), params.id);
    const inline = Boolean(query.inline) && /^(image|video)\/|^application\/pdf$/.test(attachment.contentType);
    res.setHeader('Content-Type', attachment.contentType);
    res.setHeader('Content-Length', String(attachment.sizeBytes));
    res.setHeader('Content-Disposition', files.contentDisposition(attachment.fileName, inline));
    res.setHeader('Cache-Control', 'private, max-age=300');
    stream.on('error', () => res.destroy());
    stream.pipe(res);
  }),
);

attachmentsRouter.delete(
  '/:id',
  requireRole(...officeRoles),
  validated({ params: idParams }, async ({ params }, req, res) => {
    await files.deleteAttachment(actorOf(req), params.id);
    res.status(204).end();
  }),
);

/** Wall documents: as-built drawings, controller configuration files, calibration reports. */
export const wallDocumentsRouter = Router({ mergeParams: true });
wallDocumentsRouter.use(requireAuth);
wallDocumentsRouter.get(
  '/',
  validated({ params: idParams }, async ({ params }, req, res) => {
    const actor = actorOf(req);
    await visibleWall(db(), actor, params.id);
    res.json(await files.listAttachments(actor, { wallId: params.id }));
  }),
);
wallDocumentsRouter.post(
  '/',
  requireRole(...staffRoles),
  mayUploadTo((req, id) => visibleWall(db(), actorOf(req), id)),
  validated({ params: idParams }, singleFile(), async ({ params }, req, res) => {
    const actor = actorOf(req);
    const wallId = params.id;
    const wall = await visibleWall(db(), actor, wallId);
    const internal = req.body?.internal === 'true';
    const stored = await files.storeAttachment(actor, {
      owner: { wallId },
      clientId: wall.clientId,
      purpose: 'document',
      file: req.file!,
      internal,
    });
    res.status(201).json(stored);
  }),
);

import { Router } from 'express';
import { z } from 'zod';
import { idParams } from '../../shared/schemas/common.js';
import { officeRoles, staffRoles } from '../../shared/schemas/enums.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { singleFile } from '../middleware/upload.js';
import { validate } from '../middleware/validate.js';
import * as files from '../services/attachments.js';
import { visibleWall } from '../services/walls.js';
import { db } from '../db/client.js';

export const attachmentsRouter = Router();
attachmentsRouter.use(requireAuth);

/** Downloads with the original name; images and PDFs may be shown inline (`?inline=1`). */
attachmentsRouter.get('/:id', validate({ params: idParams, query: z.object({ inline: z.string().optional() }) }), async (req, res) => {
  const { attachment, stream } = await files.openAttachment(actorOf(req), (req.valid.params as { id: string }).id);
  const inline = Boolean((req.valid.query as { inline?: string }).inline) && /^(image|video)\/|^application\/pdf$/.test(attachment.contentType);
  res.setHeader('Content-Type', attachment.contentType);
  res.setHeader('Content-Length', String(attachment.sizeBytes));
  res.setHeader('Content-Disposition', files.contentDisposition(attachment.fileName, inline));
  res.setHeader('Cache-Control', 'private, max-age=300');
  stream.on('error', () => res.destroy());
  stream.pipe(res);
});

attachmentsRouter.delete('/:id', requireRole(...officeRoles), validate({ params: idParams }), async (req, res) => {
  await files.deleteAttachment(actorOf(req), (req.valid.params as { id: string }).id);
  res.status(204).end();
});

/** Wall documents: as-built drawings, controller configuration files, calibration reports. */
export const wallDocumentsRouter = Router({ mergeParams: true });
wallDocumentsRouter.use(requireAuth);
wallDocumentsRouter.get('/', validate({ params: idParams }), async (req, res) => {
  const actor = actorOf(req);
  const wallId = (req.valid.params as { id: string }).id;
  await visibleWall(db(), actor, wallId);
  res.json({ items: await files.listAttachments(actor, { wallId }) });
});
wallDocumentsRouter.post(
  '/',
  requireRole(...staffRoles),
  validate({ params: idParams }),
  singleFile(),
  async (req, res) => {
    const actor = actorOf(req);
    const wallId = (req.valid.params as { id: string }).id;
    const wall = await visibleWall(db(), actor, wallId);
    const internal = req.body?.internal === 'true';
    const stored = await files.storeAttachment(actor, { owner: { wallId }, clientId: wall.clientId, purpose: 'document', file: req.file!, internal });
    res.status(201).json(stored);
  },
);

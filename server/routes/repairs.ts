import { Router } from 'express';
import { idParams } from '../../shared/schemas/common.js';
import { staffRoles } from '../../shared/schemas/enums.js';
import { createRepairInput, listRepairsQuery } from '../../shared/schemas/repairs.js';
import { actorOf, requireAuth, requireRole } from '../middleware/auth.js';
import { singleFile } from '../middleware/upload.js';
import { mayUploadTo } from './attachments.js';
import { validated } from '../middleware/validate.js';
import * as files from '../services/attachments.js';
import { IDEMPOTENCY_HEADER, parseIdempotencyKey } from '../services/idempotency.js';
import * as repairs from '../services/repairs.js';

export const repairsRouter = Router();
repairsRouter.use(requireAuth);
const staff = requireRole(...staffRoles);

repairsRouter.get(
  '/',
  validated({ query: listRepairsQuery }, async ({ query }, req, res) => {
    res.json(await repairs.listRepairs(actorOf(req), query));
  }),
);
/** Logs a repair from the phone; the `Idempotency-Key` header makes a retry or a double tap harmless. */
repairsRouter.post(
  '/',
  staff,
  validated({ body: createRepairInput }, async ({ body }, req, res) => {
    const key = parseIdempotencyKey(req.get(IDEMPOTENCY_HEADER));
    const answer = await repairs.createRepair(actorOf(req), key, body);
    res.status(answer.statusCode).json(answer.body);
  }),
);
repairsRouter.get(
  '/:id/photos',
  validated({ params: idParams }, async ({ params }, req, res) => {
    const actor = actorOf(req);
    await repairs.repairForPhotos(actor, params.id);
    res.json(await files.listAttachments(actor, { repairId: params.id }));
  }),
);
/** A photo of the work from the phone's camera (multipart field `file`). */
repairsRouter.post(
  '/:id/photos',
  staff,
  mayUploadTo((req, id) => repairs.repairForPhotos(actorOf(req), id)),
  validated({ params: idParams }, singleFile(), async ({ params }, req, res) => {
    const actor = actorOf(req);
    const repair = await repairs.repairForPhotos(actor, params.id);
    const stored = await files.storeAttachment(actor, {
      owner: { repairId: repair.id },
      clientId: repair.clientId,
      purpose: 'media',
      file: req.file!,
    });
    res.status(201).json(stored);
  }),
);

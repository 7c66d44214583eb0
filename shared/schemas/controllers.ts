// The controllers resource: request schemas and the response.
import { z } from 'zod';
import { PG_INT_MAX, positiveInt, requiredText, text } from './common.js';

// ---- requests ----
export const controllerInput = z
  .object({
    wallId: z.uuid().nullable().optional(),
    model: requiredText(120),
    serial: requiredText(80).transform((s) => s.toUpperCase()),
    firmware: text(80).optional(),
    outputs: positiveInt('Outputs'),
    outputsInUse: z.number().int().min(0).max(PG_INT_MAX).default(0),
    pixelsPerOutput: positiveInt('Pixels per output').default(650000),
    notes: text(5000).optional(),
  })
  .refine((c) => c.outputsInUse <= c.outputs, { path: ['outputsInUse'], message: 'Cannot use more outputs than the controller has.' });
export type ControllerInput = z.infer<typeof controllerInput>;
export const controllerPatch = z.object({
  wallId: z.uuid().nullable().optional(),
  firmware: text(80).optional(),
  outputsInUse: z.number().int().min(0).max(PG_INT_MAX).optional(),
  notes: text(5000).optional(),
  archived: z.boolean().optional(),
});
export type ControllerPatch = z.infer<typeof controllerPatch>;

// ---- responses ----

/** A processor (sending device) and the wall it drives. */
export interface Controller {
  id: string;
  wallId: string | null;
  wallName: string | null;
  model: string;
  serial: string;
  firmware: string;
  outputs: number;
  outputsInUse: number;
  pixelsPerOutput: number;
  /** Staff only: client users never receive it. */
  notes?: string;
  archived: boolean;
}

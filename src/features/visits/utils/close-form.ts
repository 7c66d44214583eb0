import { checklistItem, closeVisitInput, type CloseVisitInput } from '@shared/schemas/visits';
import { z } from 'zod';

/**
 * The form as the screen holds it ("No one could sign" is a switch, an empty pad is ''), turned
 * into the close request and checked by the shared contract, so the rules are the server's.
 */
export const closeForm = z
  .object({
    summary: z.string(),
    checklist: z.array(checklistItem),
    noSigner: z.boolean(),
    signedByName: z.string(),
    signature: z.string(),
    unsignedReason: z.string(),
  })
  .transform(({ noSigner, signedByName, signature, unsignedReason, ...rest }): CloseVisitInput =>
    noSigner ? { ...rest, unsignedReason } : signature ? { ...rest, signedByName, signature } : { ...rest, signedByName },
  )
  .pipe(closeVisitInput);
export type CloseForm = z.input<typeof closeForm>;

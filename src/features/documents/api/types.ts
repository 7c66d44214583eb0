import type { attachmentKinds } from '@shared/schemas/enums';

/** A stored file as the API presents it (server/services/attachments.ts presentAttachment). */
export interface Attachment {
  id: string;
  kind: (typeof attachmentKinds)[number];
  fileName: string;
  contentType: string;
  sizeBytes: number;
  /** Staff only: client users never see internal files. */
  internal: boolean;
  uploadedByName: string | null;
  createdAt: string;
  /** Download link (`?inline=1` shows images and PDFs in the browser). */
  url: string;
}

// The attachments resource: a stored file as the API presents it, whether a ticket's photo or
// video (`/api/tickets/:id/attachments`) or a wall's document (`/api/walls/:id/documents`).
// Uploads are multipart (field `file`), so they have no request schema here.
import type { AttachmentKind } from './enums.js';

export interface Attachment {
  id: string;
  kind: AttachmentKind;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  /** Staff only see internal files: client users never receive them. */
  internal: boolean;
  uploadedByName: string | null;
  createdAt: string;
  /** The download link (`?inline=1` shows images, videos and PDFs in the page). */
  url: string;
}

// Writes to a wall's documents.
import { attachmentKeys, attachmentRequests } from '@/resources/attachments';
import { useWrite } from '@/lib/mutation';

export const useUploadWallDocument = () =>
  useWrite(attachmentRequests.uploadToWall, (_file, { wallId }) => [attachmentKeys.ofWall(wallId)]);
export const useDeleteDocument = () => useWrite(attachmentRequests.delete, [attachmentKeys.all]);

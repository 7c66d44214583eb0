/** Query keys of documents (files kept on a wall). */
export const documentsKeys = {
  all: ['documents'] as const,
  wall: (wallId: string) => [...documentsKeys.all, 'wall', wallId] as const,
};

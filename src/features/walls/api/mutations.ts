// Writes to a wall. A wall shows on its site's and client's pages too.
import { clientKeys } from '@/resources/clients';
import { siteKeys } from '@/resources/sites';
import { wallKeys, wallRequests } from '@/resources/walls';
import { useWrite } from '@/lib/mutation';

export const useCreateWall = () => useWrite(wallRequests.create, [wallKeys.all, siteKeys.all, clientKeys.all]);
export const useUpdateWall = () =>
  useWrite(wallRequests.update, [wallKeys.all, siteKeys.all, clientKeys.all], (wall, set) => set(wallKeys.detail(wall.id), wall));

// The planner's writes: a plan saved onto a wall refreshes every screen of that wall; a new wall
// made from the plan shows on its site's and client's pages too.
import { clientKeys } from '@/resources/clients';
import { siteKeys } from '@/resources/sites';
import { wallKeys, wallRequests } from '@/resources/walls';
import { useWrite } from '@/lib/mutation';

export const useSaveWallPlan = () => useWrite(wallRequests.savePlan, [wallKeys.all], (wall, set) => set(wallKeys.detail(wall.id), wall));
export const useCreateWallFromPlan = () =>
  useWrite(wallRequests.createFromPlan, [wallKeys.all, siteKeys.all, clientKeys.all], (wall, set) => set(wallKeys.detail(wall.id), wall));

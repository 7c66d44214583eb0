// The planner's write: a plan saved onto a wall refreshes every screen of that wall.
import { wallKeys, wallRequests } from '@/resources/walls';
import { useWrite } from '@/lib/mutation';

export const useSaveWallPlan = () => useWrite(wallRequests.savePlan, [wallKeys.all], (wall, set) => set(wallKeys.detail(wall.id), wall));

// The catalogue's writes. Models show on wall pages and in the planner, controllers on the wall
// they drive: each write refreshes those too.
import { cabinetModelKeys, cabinetModelRequests } from '@/resources/cabinet-models';
import { controllerKeys, controllerRequests } from '@/resources/controllers';
import { wallKeys } from '@/resources/walls';
import { useWrite } from '@/lib/mutation';

export const useCreateCabinetModel = () => useWrite(cabinetModelRequests.create, [cabinetModelKeys.all]);
export const useUpdateCabinetModel = () => useWrite(cabinetModelRequests.update, [cabinetModelKeys.all, wallKeys.all]);
export const useCreateController = () => useWrite(controllerRequests.create, [controllerKeys.all, wallKeys.all]);
export const useUpdateController = () => useWrite(controllerRequests.update, [controllerKeys.all, wallKeys.all]);

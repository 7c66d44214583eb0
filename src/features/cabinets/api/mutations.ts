// Writes to cabinets. A cabinet change moves counts and cells on wall pages and in search results
// too, so each write refreshes the cabinets, the walls and the search.
import { cabinetKeys, cabinetRequests } from '@/resources/cabinets';
import { searchKeys } from '@/resources/search';
import { wallKeys } from '@/resources/walls';
import { useWrite } from '@/lib/mutation';

const owners = [cabinetKeys.all, wallKeys.all, searchKeys.all];

export const usePlaceCabinet = () => useWrite(cabinetRequests.place, owners);
export const useMoveCabinet = () => useWrite(cabinetRequests.move, owners);
export const useSwapCabinets = () => useWrite(cabinetRequests.swap, owners);
export const useUpdateCabinet = () => useWrite(cabinetRequests.update, owners);
export const useImportCabinets = () => useWrite(cabinetRequests.import, owners);

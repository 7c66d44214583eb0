// The stock's write: a movement changes the counts, the ledger and the low-stock list.
import { useWrite } from '@/lib/mutation';
import { stockKeys, stockRequests } from '@/resources/stock';

export const useRecordMovement = () => useWrite(stockRequests.move, [stockKeys.all]);
export const useOpenReturn = () => useWrite(stockRequests.openReturn, [stockKeys.all]);
export const useUpdateReturn = () => useWrite(stockRequests.updateReturn, [stockKeys.all]);
export const useCreatePart = () => useWrite(stockRequests.createPart, [stockKeys.all]);
export const useUpdatePart = () => useWrite(stockRequests.updatePart, [stockKeys.all]);
export const useCreateLocation = () => useWrite(stockRequests.createLocation, [stockKeys.all]);
export const useUpdateLocation = () => useWrite(stockRequests.updateLocation, [stockKeys.all]);
export const useSetReorderPoint = () => useWrite(stockRequests.setReorderPoint, [stockKeys.all]);

// The stock's write: a movement changes the counts, the ledger and the low-stock list.
import { useWrite } from '@/lib/mutation';
import { stockKeys, stockRequests } from '@/resources/stock';

export const useRecordMovement = () => useWrite(stockRequests.move, [stockKeys.all]);
export const useOpenReturn = () => useWrite(stockRequests.openReturn, [stockKeys.all]);
export const useUpdateReturn = () => useWrite(stockRequests.updateReturn, [stockKeys.all]);

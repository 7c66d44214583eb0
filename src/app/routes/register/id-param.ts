import { data, type Params } from 'react-router-dom';
import { isRecordId } from '@/lib/record-id';

/** The record id of a register page's address; anything that is not an id is "not found". */
export function idParam(params: Params): string {
  const id = params.id ?? '';
  if (!isRecordId(id)) throw data('Not found', { status: 404 });
  return id;
}

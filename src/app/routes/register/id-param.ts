import { data, type Params } from 'react-router-dom';

const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The record id of a register page's address; anything that is not an id is "not found". */
export function idParam(params: Params): string {
  const id = params.id ?? '';
  if (!uuid.test(id)) throw data('Not found', { status: 404 });
  return id;
}

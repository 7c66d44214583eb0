import { AppError } from '../errors.js';

/**
 * What a database constraint violation means to a person. The database is the last line of
 * defence (two people placing cabinets at once, two technicians taking the last spare); this
 * table turns its refusals into the same 400/409 answers the services give.
 */
const byConstraint: Record<string, () => AppError> = {
  cabinets_serial_key: () => new AppError(409, 'serial_taken', 'Another cabinet already has that serial.', { serial: 'Already in use.' }),
  cabinets_wall_position_key: () =>
    new AppError(409, 'position_taken', 'Another cabinet already sits at that position.', { column: 'Occupied.', row: 'Occupied.' }),
  cabinets_position_inside_grid: () =>
    new AppError(400, 'outside_grid', 'That position is outside the wall’s grid.', {
      column: 'Outside the grid.',
      row: 'Outside the grid.',
    }),
  walls_grid_holds_cabinets: () =>
    new AppError(409, 'grid_too_small', 'Cabinets sit outside the smaller grid. Move or remove them first.', {
      columns: 'Too small.',
      rows: 'Too small.',
    }),
  clients_name_key: () => new AppError(409, 'name_taken', 'A client with that name already exists.', { name: 'Already in use.' }),
  sites_client_name_key: () =>
    new AppError(409, 'name_taken', 'This client already has a site with that name.', { name: 'Already in use.' }),
  walls_site_name_key: () => new AppError(409, 'name_taken', 'This site already has a wall with that name.', { name: 'Already in use.' }),
  cabinet_models_name_key: () =>
    new AppError(409, 'name_taken', 'A cabinet model with that name already exists.', { name: 'Already in use.' }),
  controllers_serial_key: () =>
    new AppError(409, 'serial_taken', 'Another controller already has that serial.', { serial: 'Already in use.' }),
  service_plans_name_key: () =>
    new AppError(409, 'name_taken', 'A service plan with that name already exists.', { name: 'Already in use.' }),
  parts_sku_key: () => new AppError(409, 'sku_taken', 'Another part already has that SKU.', { sku: 'Already in use.' }),
  stock_locations_name_key: () =>
    new AppError(409, 'name_taken', 'A stock location with that name already exists.', { name: 'Already in use.' }),
  contacts_client_user_key: () =>
    new AppError(409, 'user_linked', 'Another contact already signs in as that person.', { userId: 'Already linked.' }),
  users_email_key: () =>
    new AppError(409, 'email_taken', 'Someone already has an account with that e-mail address.', { email: 'Already in use.' }),
  stock_balances_not_negative: () =>
    new AppError(409, 'insufficient_stock', 'There is not enough of that part at that location.', { quantity: 'More than is on hand.' }),
};

interface PgError {
  code?: string;
  constraint?: string;
}

/** The AppError for a known constraint violation, or undefined. Drizzle wraps pg errors in `cause`. */
export function fromConstraintViolation(err: unknown): AppError | undefined {
  for (let e = err as (PgError & { cause?: unknown }) | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    if (typeof e.code === 'string' && /^23/.test(e.code) && e.constraint && byConstraint[e.constraint]) {
      return byConstraint[e.constraint]();
    }
  }
  return undefined;
}

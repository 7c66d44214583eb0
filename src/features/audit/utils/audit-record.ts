import type { AuditRecordPage } from '@shared/schemas/users';
import { paths } from '@/config/paths';

/** The address of a record's page, as the server described it. */
export function auditRecordHref(page: AuditRecordPage): string {
  switch (page.kind) {
    case 'client':
      return paths.client.getHref(page.id);
    case 'site':
      return paths.site.getHref(page.id);
    case 'wall':
      return paths.wall.getHref(page.id);
    case 'ticket':
      return paths.ticket.getHref(page.id);
    case 'visit':
      return paths.visit.getHref(page.id);
    case 'part':
      return paths.stock.getHref({ partId: page.id, tab: 'ledger' });
    case 'stock_location':
      return paths.stock.getHref({ locationId: page.id });
    case 'cabinet':
      return paths.cabinetLabel.getHref(page.serial);
    case 'user':
      return paths.admin.users.getHref({ q: page.email });
    case 'catalogue':
      return paths.catalogue.getHref(page.tab);
    case 'vendor_returns':
      return paths.stock.getHref({ tab: 'returns' });
  }
}

/** The kinds of record the log speaks of (the server's `entity` names). */
export const entityLabels: Record<string, string> = {
  user: 'User',
  client: 'Client',
  site: 'Site',
  contact: 'Contact',
  service_plan: 'Service plan',
  wall: 'Wall',
  cabinet: 'Cabinet',
  cabinet_model: 'Cabinet model',
  controller: 'Controller',
  ticket: 'Ticket',
  visit: 'Visit',
  repair: 'Repair',
  maintenance_plan: 'Maintenance plan',
  part: 'Part',
  reorder_point: 'Reorder point',
  stock_location: 'Stock location',
  stock_movement: 'Stock movement',
  vendor_return: 'Vendor return',
  attachment: 'File',
  company_settings: 'Company settings',
};

export const entityLabel = (entity: string) => entityLabels[entity] ?? entity.replace(/_/g, ' ');

export const actionLabel = (action: string) => {
  const text = action.replace(/_/g, ' ');
  return text.charAt(0).toUpperCase() + text.slice(1);
};

const fieldNames: Record<string, string> = {
  email: 'E-mail',
  clientId: 'Client',
  siteId: 'Site',
  wallId: 'Wall',
  fromWallId: 'From wall',
  toWallId: 'To wall',
  cabinetId: 'Cabinet',
  cabinetModelId: 'Cabinet model',
  ticketId: 'Ticket',
  visitId: 'Visit',
  partId: 'Part',
  stockLocationId: 'Stock location',
  locationId: 'Location',
  fromLocationId: 'From location',
  toLocationId: 'To location',
  backToLocationId: 'Back to location',
  assigneeId: 'Assignee',
  reporterId: 'Reported by',
  authorId: 'Author',
  holderId: 'Holder',
  technicianIds: 'Technicians',
  commentId: 'Comment',
  servicePlanId: 'Service plan',
  mergedIntoId: 'Merged into',
  passwordChangedAt: 'Password changed',
};

/** "assigneeId" → "Assignee", "windowStart" → "Window start", "last_sign_in_at" → "Last sign in at". */
export function fieldLabel(key: string): string {
  if (fieldNames[key]) return fieldNames[key];
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** The fields an event changed, in a stable order (both sides' keys). */
export function changedFields(before: unknown, after: unknown): string[] {
  const keys = new Set<string>();
  for (const side of [before, after]) {
    if (side && typeof side === 'object' && !Array.isArray(side)) for (const key of Object.keys(side)) keys.add(key);
  }
  return [...keys].sort();
}

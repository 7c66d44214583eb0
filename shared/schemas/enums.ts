// The product's vocabularies, shared by the database enums, the API contracts and the screens.

export const roles = ['admin', 'coordinator', 'technician', 'client'] as const;
export type Role = (typeof roles)[number];
export const staffRoles = ['admin', 'coordinator', 'technician'] as const;
export const officeRoles = ['admin', 'coordinator'] as const;

export const mountings = ['ground_stacked', 'flown', 'wall_fixed', 'curved'] as const;
export type Mounting = (typeof mountings)[number];

export const environments = ['indoor', 'outdoor'] as const;

export const cabinetStatuses = ['installed', 'spare', 'at_bench', 'returned_to_vendor', 'retired'] as const;
export type CabinetStatus = (typeof cabinetStatuses)[number];

export const cabinetEventKinds = ['placed', 'moved', 'swapped', 'removed', 'repaired', 'status_changed', 'imported'] as const;
export type CabinetEventKind = (typeof cabinetEventKinds)[number];

export const ticketPriorities = ['critical', 'high', 'normal', 'low'] as const;
export type TicketPriority = (typeof ticketPriorities)[number];

export const ticketStatuses = [
  'new',
  'acknowledged',
  'scheduled',
  'in_progress',
  'waiting_parts',
  'waiting_client',
  'resolved',
  'closed',
] as const;
export type TicketStatus = (typeof ticketStatuses)[number];

export const ticketScopes = ['cells', 'whole_wall', 'controller', 'site'] as const;
export type TicketScope = (typeof ticketScopes)[number];

export const commentVisibilities = ['public', 'internal'] as const;
export type CommentVisibility = (typeof commentVisibilities)[number];

export const clockModes = ['business', 'round_the_clock'] as const;
export type ClockMode = (typeof clockModes)[number];

export const visitKinds = ['ticket', 'maintenance'] as const;
export type VisitKind = (typeof visitKinds)[number];
export const visitStatuses = ['planned', 'in_progress', 'completed', 'cancelled'] as const;
export type VisitStatus = (typeof visitStatuses)[number];

export const repairComponents = ['module', 'power_supply', 'receiving_card', 'data_cable', 'power_cable', 'fan', 'whole_cabinet'] as const;
export type RepairComponent = (typeof repairComponents)[number];

export const repairFaults = ['dead_module', 'dead_pixels', 'colour_shift', 'flicker', 'no_signal', 'physical_damage', 'other'] as const;
export type RepairFault = (typeof repairFaults)[number];

export const repairActions = ['replaced', 'reseated', 'recalibrated', 'cabinet_swapped', 'cleaned'] as const;
export type RepairAction = (typeof repairActions)[number];

export const removedPartFates = ['none', 'to_bench', 'to_vendor_return', 'scrapped'] as const;
export type RemovedPartFate = (typeof removedPartFates)[number];

export const partKinds = ['module', 'power_supply', 'receiving_card', 'cable', 'fan', 'cabinet'] as const;
export type PartKind = (typeof partKinds)[number];

export const stockLocationKinds = ['warehouse', 'van', 'site_kit'] as const;
export type StockLocationKind = (typeof stockLocationKinds)[number];

export const stockMovementKinds = [
  'receipt',
  'transfer',
  'consumption',
  'return_from_wall',
  'sent_to_vendor',
  'back_from_vendor',
  'adjustment',
] as const;
export type StockMovementKind = (typeof stockMovementKinds)[number];

export const vendorReturnOutcomes = ['pending', 'repaired', 'replaced', 'refused'] as const;
export type VendorReturnOutcome = (typeof vendorReturnOutcomes)[number];

export const mailStatuses = ['queued', 'sending', 'sent', 'failed'] as const;

export const authTokenKinds = ['invite', 'reset'] as const;
export type AuthTokenKind = (typeof authTokenKinds)[number];

export const attachmentKinds = ['photo', 'video', 'document'] as const;
export type AttachmentKind = (typeof attachmentKinds)[number];

import { roles, type Role } from '@shared/schemas/enums';

export const roleDescriptions: Record<Role, { label: string; hint: string }> = {
  admin: { label: 'Admin', hint: 'Everything, including users, service plans and company settings.' },
  coordinator: { label: 'Coordinator', hint: 'Office work: clients, walls, tickets, visits, stock and reports.' },
  technician: { label: 'Technician', hint: 'Field work: their visits, repairs and van stock, on a phone.' },
  client: { label: 'Client contact', hint: "Their own organisation's walls, tickets and visit reports only." },
};

export const roleOptions = roles.map((value) => ({ value, label: roleDescriptions[value].label }));

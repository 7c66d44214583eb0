import { format, formatDistanceToNowStrict, isValid, parseISO } from 'date-fns';

const parse = (iso: string | null | undefined) => {
  if (!iso) return null;
  const d = parseISO(iso);
  return isValid(d) ? d : null;
};

/** "14 Mar 2025, 09:41" in the viewer's time zone; '—' when there is no date. */
export function formatDateTime(iso: string | null | undefined): string {
  const d = parse(iso);
  return d ? format(d, 'd MMM yyyy, HH:mm') : '—';
}

export function formatDate(iso: string | null | undefined): string {
  const d = parse(iso);
  return d ? format(d, 'd MMM yyyy') : '—';
}

/** "3 hours ago"; '—' when there is no date. */
export function formatAgo(iso: string | null | undefined): string {
  const d = parse(iso);
  return d ? formatDistanceToNowStrict(d, { addSuffix: true }) : '—';
}

export function firstName(name: string): string {
  return name.trim().split(/\s+/)[0] || name;
}

export function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const letters = parts.length > 1 ? parts[0][0] + parts[parts.length - 1][0] : (parts[0] ?? '?').slice(0, 2);
  return letters.toUpperCase();
}

export const roleLabels = {
  admin: 'Admin',
  coordinator: 'Coordinator',
  technician: 'Technician',
  client: 'Client',
} as const;

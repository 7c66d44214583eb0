import { describe, expect, it } from 'vitest';
import {
  filtersFromParams,
  filtersToRecord,
  sameFilters,
  statusChoiceOf,
  withStatusChoice,
} from '@/features/tickets/components/ticket-filters';

// The values the API accepts are those of shared/schemas/tickets.ts listTicketsQuery.
describe('ticket list filters in the address', () => {
  it('keeps known values and drops the rest', () => {
    const f = filtersFromParams(
      new URLSearchParams(
        'status=new,bogus,resolved&priority=urgent&clock=at_risk,breached&assigneeId=me&clientId=not-an-id&q=%2012%2F26%20&sort=resolutionDueAt&dir=sideways',
      ),
    );
    expect(f).toEqual({
      status: 'new,resolved',
      open: undefined,
      priority: undefined,
      clock: 'at_risk,breached',
      clientId: undefined,
      siteId: undefined,
      wallId: undefined,
      assigneeId: 'me',
      q: '12/26',
      sort: 'resolutionDueAt',
      dir: undefined,
    });
    expect(filtersToRecord(f)).toEqual({
      status: 'new,resolved',
      clock: 'at_risk,breached',
      assigneeId: 'me',
      q: '12/26',
      sort: 'resolutionDueAt',
    });
  });

  it('opens on the open tickets; open=all, and only that, shows every ticket', () => {
    expect(filtersFromParams(new URLSearchParams('')).open).toBe('true');
    expect(filtersFromParams(new URLSearchParams('q=fan')).open).toBe('true');
    expect(filtersFromParams(new URLSearchParams('status=bogus')).open).toBe('true');
    expect(filtersFromParams(new URLSearchParams('open=all')).open).toBeUndefined();
    expect(filtersFromParams(new URLSearchParams('open=false')).open).toBe('false');
    expect(filtersFromParams(new URLSearchParams('status=closed')).open).toBeUndefined();
    // "Any status" is written into the address, so that a reload keeps every ticket.
    expect(filtersToRecord({ q: 'fan' })).toEqual({ q: 'fan', open: 'all' });
    expect(filtersFromParams(new URLSearchParams(filtersToRecord({ q: 'fan' }))).open).toBeUndefined();
    expect(filtersToRecord({ open: 'true' })).toEqual({ open: 'true' });
  });

  it('accepts an assignee id, "none" and "me", and nothing else', () => {
    const id = '0b7f5a7e-3c1d-4b7e-9d8a-0a1b2c3d4e5f';
    expect(filtersFromParams(new URLSearchParams(`assigneeId=${id}`)).assigneeId).toBe(id);
    expect(filtersFromParams(new URLSearchParams('assigneeId=none')).assigneeId).toBe('none');
    expect(filtersFromParams(new URLSearchParams('assigneeId=everyone')).assigneeId).toBeUndefined();
  });

  it('maps the one status select onto open/status', () => {
    expect(withStatusChoice({ status: 'new' }, 'open')).toMatchObject({ open: 'true', status: undefined });
    expect(withStatusChoice({ open: 'true' }, 'waiting_parts')).toMatchObject({ open: undefined, status: 'waiting_parts' });
    expect(statusChoiceOf({ open: 'false' })).toBe('done');
    expect(statusChoiceOf({})).toBe('');
  });

  it('compares filters by their values, not by empty keys', () => {
    expect(sameFilters({ q: 'x', status: undefined }, { q: 'x' })).toBe(true);
    expect(sameFilters({ q: 'x' }, { q: 'y' })).toBe(false);
  });
});

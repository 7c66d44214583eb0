/**
 * Query keys of the today board. Filed under the tickets' root key on purpose: any change to a
 * ticket (which invalidates ['tickets']) refreshes the board too.
 */
export const boardKeys = {
  all: ['tickets', 'board'] as const,
  attention: () => [...boardKeys.all, 'attention'] as const,
  waiting: () => [...boardKeys.all, 'waiting'] as const,
  counts: () => [...boardKeys.all, 'counts'] as const,
};

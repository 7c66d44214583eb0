/** Query keys of the development mailbox. */
export const mailboxKeys = {
  all: ['mailbox'] as const,
  list: () => [...mailboxKeys.all, 'list'] as const,
};

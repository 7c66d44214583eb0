import type { Role } from '@shared/schemas/enums';

export interface UserFilters {
  q?: string;
  role?: Role;
}

/** Query keys of the users feature, general to specific. */
export const usersKeys = {
  all: ['users'] as const,
  lists: () => [...usersKeys.all, 'list'] as const,
  list: (filters: UserFilters) => [...usersKeys.lists(), filters] as const,
  /**
   * The organisation picker's choices. Filed under the clients' root key on purpose, so that
   * any change to clients (which invalidates ['clients']) refreshes the picker as well.
   */
  organisationOptions: () => ['clients', 'options'] as const,
};

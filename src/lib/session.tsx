import type { SessionUser } from '@shared/schemas/auth';
import { officeRoles } from '@shared/schemas/enums';
import { createContext, useContext, type ReactNode } from 'react';

const SessionContext = createContext<SessionUser | null>(null);

/** Holds the signed-in user for every screen inside the app's shell. */
export function SessionProvider({ user, children }: { user: SessionUser; children: ReactNode }) {
  return <SessionContext.Provider value={user}>{children}</SessionContext.Provider>;
}

/** The signed-in user; only for screens inside the shell (which sends signed-out people away). */
export function useUser(): SessionUser {
  const user = useContext(SessionContext);
  if (!user) throw new Error('useUser() is only available inside the signed-in shell.');
  return user;
}

export type Audience = 'office' | 'technician' | 'client';

/** Which of the three shells a person sees. */
export function audienceOf(user: Pick<SessionUser, 'role'>): Audience {
  if (user.role === 'client') return 'client';
  if (user.role === 'technician') return 'technician';
  return 'office';
}

export const isOffice = (user: Pick<SessionUser, 'role'>) => (officeRoles as readonly string[]).includes(user.role);

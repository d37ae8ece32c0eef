import { createContext, useContext, type ReactNode } from 'react';
import type { UserDto } from '@fuelwright/shared';

/**
 * The signed-in user, provided by the app shell from the session query. Features read it here
 * instead of importing the auth feature (features do not import each other).
 */
const CurrentUserContext = createContext<UserDto | null>(null);

export function CurrentUserProvider({ user, children }: { user: UserDto | null; children: ReactNode }) {
  return <CurrentUserContext.Provider value={user}>{children}</CurrentUserContext.Provider>;
}

/** The signed-in user, or null for a visitor. */
export function useCurrentUser(): UserDto | null {
  return useContext(CurrentUserContext);
}

/** The signed-in user on pages behind a session guard. */
export function useRequiredUser(): UserDto {
  const user = useContext(CurrentUserContext);
  if (!user) throw new Error('useRequiredUser needs a signed-in user (is the page behind the session guard?)');
  return user;
}

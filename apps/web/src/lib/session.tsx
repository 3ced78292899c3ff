import { createContext, use, type ReactNode } from 'react';
import { can, type Action, type MeView } from '@seamwright/shared';

/**
 * Who is signed in and in which company. The app layout route loads `/api/me` and provides
 * it here, so features read the session without importing the auth feature.
 */
const SessionContext = createContext<MeView | null>(null);

export function SessionProvider({ me, children }: { me: MeView; children: ReactNode }) {
  return <SessionContext value={me}>{children}</SessionContext>;
}

export function useSession(): MeView {
  const me = use(SessionContext);
  if (!me) throw new Error('useSession() is only available inside the signed-in layout');
  return me;
}

/** The session when inside the signed-in layout, else null (for parts that also render outside it). */
export function useOptionalSession(): MeView | null {
  return use(SessionContext);
}

/** Whether the signed-in role may do `action` (the server checks again; this only hides). */
export function useCan(action: Action): boolean {
  return can(useSession().role, action);
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MembershipJson, SessionJson } from '@shared/schemas/session';
import { api, isApiError } from '../../../lib/api-client';

/** The signed-in session, or null when nobody is signed in (the server answers 401). */
export async function getSession(signal?: AbortSignal): Promise<SessionJson | null> {
  try {
    return await api.get<SessionJson>('/api/session', signal);
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const sessionQueryOptions = () =>
  queryOptions({
    queryKey: ['session'],
    queryFn: ({ signal }) => getSession(signal),
    // Who is signed in changes only through our own calls, and those write this entry themselves.
    staleTime: Infinity,
  });

export function useSession() {
  return useQuery(sessionQueryOptions());
}

export function activeMembership(session: SessionJson): MembershipJson | undefined {
  return session.memberships.find((membership) => membership.active);
}

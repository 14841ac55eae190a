import { createContext, useContext } from 'react';
import { can, type Capability } from '@shared/roles';
import type { MembershipJson, UserJson } from '@shared/schemas/session';

/** The signed-in person and the team they are working in, as the app shell resolved them. */
export interface Viewer {
  user: UserJson;
  membership: MembershipJson;
}

const ViewerContext = createContext<Viewer | null>(null);

export const ViewerProvider = ViewerContext.Provider;

export function useViewer(): Viewer {
  const viewer = useContext(ViewerContext);
  if (!viewer) throw new Error('useViewer needs a ViewerProvider (rendered by the app shell)');
  return viewer;
}

/** Hides what a member cannot do; the server still decides, this only spares a useless button. */
export function useCan(capability: Capability): boolean {
  return can(useViewer().membership.roles, capability);
}

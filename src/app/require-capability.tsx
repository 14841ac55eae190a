import type { ReactNode } from 'react';
import type { Capability } from '@shared/roles';
import { LinkButton } from '../components/ui/button';
import { useCan } from '../lib/authorization';

/** For a page reached by a typed or shared link: the navigation already hides it from this role. */
export function RequireCapability({ capability, children }: { capability: Capability; children: ReactNode }) {
  if (useCan(capability)) return children;
  return (
    <div className="flex flex-col items-start gap-4">
      <h1 className="text-3xl font-bold">Not available with your role</h1>
      <p className="text-lg text-ink-muted">A mentor can change your roles on the team page if you need this.</p>
      <LinkButton to="/">Back to the board</LinkButton>
    </div>
  );
}

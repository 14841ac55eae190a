import type { ItemKind } from '@shared/domain/checklist';
import { ROLE_LABELS, type Role } from '@shared/roles';
import { KIND_LABELS } from './item-kinds';

export interface ItemFacts {
  kind: ItemKind;
  required: boolean;
  /** "10 – 14 V", from describeLimits. */
  limits: string | null;
  options: string[];
  role: Role | null;
  bumperColour: boolean;
}

const tag = 'inline-flex items-center rounded-lg px-2 py-0.5 text-sm font-semibold';

/** An item's kind, limits or options, whether it is required and who usually does it, as words. */
export function ItemTags({ kind, required, limits, options, role, bumperColour }: ItemFacts) {
  return (
    <ul className="flex flex-wrap gap-1.5" aria-label="About this item">
      <li className={`${tag} bg-sunken text-ink`}>
        {KIND_LABELS[kind]}
        {kind === 'number' && limits && `: ${limits}`}
        {kind === 'choice' && options.length > 0 && `: ${options.join(' / ')}`}
      </li>
      <li className={required ? `${tag} bg-accent-soft text-accent-ink` : `${tag} border border-line text-ink-muted`}>
        {required ? 'Required' : 'Optional'}
      </li>
      {bumperColour && <li className={`${tag} bg-sunken text-ink`}>Bumper colour</li>}
      {role && <li className={`${tag} border border-line text-ink-muted`}>{ROLE_LABELS[role]}</li>}
    </ul>
  );
}

import { PHASE_LABELS } from '@shared/domain/checklist';
import type { TemplateJson } from '@shared/schemas/checks';
import { StaleNotice } from '../../../../components/ui/stale-notice';
import { templateDiff } from './template-diff';

interface StaleTemplateNoticeProps {
  /** The version the editor started from. */
  base: TemplateJson;
  theirs: TemplateJson;
  pending: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

const quoted = (labels: string[]) => labels.map((label) => `‘${label}’`).join(', ');

/** Someone saved a newer version while this one was being edited: what they changed, and the user's edits kept below. */
export function StaleTemplateNotice({ base, theirs, pending, onKeepMine, onTakeTheirs }: StaleTemplateNoticeProps) {
  const diff = templateDiff(base, theirs);
  const rows: [string, string][] = [];
  if (diff.name !== null) rows.push(['Name', diff.name]);
  if (diff.phase !== null) rows.push(['When', PHASE_LABELS[diff.phase]]);
  if (diff.added.length > 0) rows.push(['Added', quoted(diff.added)]);
  if (diff.removed.length > 0) rows.push(['Removed', quoted(diff.removed)]);
  if (diff.changed.length > 0) rows.push(['Changed', quoted(diff.changed)]);
  if (diff.reordered) rows.push(['Order', 'Items moved']);
  const by = theirs.updatedBy ? ` by ${theirs.updatedBy.name}` : '';
  return (
    <StaleNotice
      what="this checklist"
      intro={`Version ${theirs.version} was saved${by} while you were editing. Your edits are still in the form above. Saving yours replaces what you changed (the name, the phase or the item list) and keeps the rest of theirs.`}
      pending={pending}
      onKeepMine={onKeepMine}
      onTakeTheirs={onTakeTheirs}
    >
      {rows.length > 0 ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg bg-surface p-3">
          {rows.map(([term, detail]) => (
            <div key={term} className="contents">
              <dt className="font-semibold">{term}</dt>
              <dd className="break-words">{detail}</dd>
            </div>
          ))}
        </dl>
      ) : (
        <p>Their version has the same name and items as the one you started from.</p>
      )}
    </StaleNotice>
  );
}

import type { RepairJson } from '@shared/schemas/repairs';
import { StaleNotice } from '../../../components/ui/stale-notice';
import { FIELD_LABELS, formatValue, type Namers, type TicketField } from './repair-format';
import { changedFields, type EditBody } from './repair-form-values';

interface StaleRepairNoticeProps {
  /** The version the edit started from. */
  base: RepairJson;
  theirs: RepairJson;
  /** What is in the form now, read as a body (null while the form has mistakes). */
  mine: EditBody | null;
  names: Namers;
  pending: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

/**
 * Someone saved the ticket while it was being edited here: each field they changed, theirs beside
 * what is in the form. "Keep mine" saves the fields the user changed over their version (their
 * other changes stay); "Use theirs" puts their values into the form.
 */
export function StaleRepairNotice({ base, theirs, mine, names, pending, onKeepMine, onTakeTheirs }: StaleRepairNoticeProps) {
  const fields: TicketField[] = [...(theirs.status !== base.status ? (['status'] as const) : []), ...changedFields(base, theirs)];
  const theirValue = (field: TicketField) => formatValue(field, field === 'status' ? theirs.status : field === 'assigneeId' ? (theirs.assignee?.id ?? null) : theirs[field], names);
  const myValue = (field: TicketField) => (field === 'status' ? formatValue('status', base.status, names) : mine ? formatValue(field, mine[field], names) : '…');
  return (
    <StaleNotice
      what="this ticket"
      intro={`Your edits are still in the form. Keep mine saves the fields you changed over their version; the fields you did not touch keep their values.`}
      pending={pending}
      onKeepMine={onKeepMine}
      onTakeTheirs={onTakeTheirs}
      keepMineLabel="Keep mine"
      takeTheirsLabel="Use theirs"
    >
      {fields.length === 0 ? (
        <p>They saved without changing any field you can edit here.</p>
      ) : (
        <div className="overflow-x-auto rounded-lg bg-surface">
          <table className="w-full text-left">
            <caption className="sr-only">What they changed</caption>
            <thead>
              <tr className="border-b border-line">
                <th scope="col" className="p-2 font-semibold">
                  Field
                </th>
                <th scope="col" className="p-2 font-semibold">
                  Theirs
                </th>
                <th scope="col" className="p-2 font-semibold">
                  Yours
                </th>
              </tr>
            </thead>
            <tbody>
              {fields.map((field) => (
                <tr key={field} className="border-b border-line last:border-0 align-top">
                  <th scope="row" className="p-2 font-semibold">
                    {FIELD_LABELS[field]}
                  </th>
                  <td className="p-2 break-words">{theirValue(field)}</td>
                  <td className="p-2 break-words">{myValue(field)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </StaleNotice>
  );
}

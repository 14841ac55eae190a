import type { ScheduleFileError } from '@shared/schemas/schedule';
import { AlertIcon } from '../../../components/ui/icons';

/** Every problem of a refused file, so the lead fixes them all in one pass instead of one per upload. */
export function ImportBadRows({ message, rows }: { message: string; rows: readonly ScheduleFileError[] }) {
  return (
    <div role="alert" className="flex flex-col gap-3 rounded-xl border-2 border-danger bg-danger-soft p-4 text-ink">
      <p className="flex items-center gap-2 text-lg font-bold">
        <AlertIcon className="size-6 shrink-0 text-danger" /> {message}
      </p>
      <p>Fix these lines in the file, save it as CSV and choose it again. Line 1 is the header.</p>
      <div className="overflow-x-auto rounded-lg bg-surface">
        <table className="w-full text-left">
          <thead className="border-b border-line text-sm text-ink-muted">
            <tr>
              <th scope="col" className="px-3 py-2">Line</th>
              <th scope="col" className="px-3 py-2">Column</th>
              <th scope="col" className="px-3 py-2">What is wrong</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row, index) => (
              <tr key={`${row.row}-${row.column}-${index}`} className="border-b border-line last:border-0">
                <td className="px-3 py-2 font-bold tabular-nums">{row.row}</td>
                <td className="px-3 py-2 font-mono text-sm">{row.column ?? 'whole line'}</td>
                <td className="px-3 py-2">{row.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

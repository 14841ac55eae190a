import { useRef, useState, type ChangeEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CheckIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { isApiError } from '../../../lib/api-client';
import { badRowsOf, useImportSchedule } from '../api/import-schedule';
import { CsvFormatHelp } from './csv-format-help';
import { ImportBadRows } from './import-bad-rows';
import { firstKeysOf, ImportCounts, ImportFirstRows } from './import-preview';

interface ImportSchedulePanelProps {
  eventId: string;
  timeZone: string;
  zoneLabel: string;
  onClose?: () => void;
}

/** The upload's own refusals (not CSV, empty, too big) name the field `file`: say that, not "Check these fields". */
function uploadMessage(error: unknown): unknown {
  if (isApiError(error) && error.fields.file) return new Error(error.fields.file);
  return error;
}

/**
 * Import in two steps: choosing a file previews it (the server runs the import and rolls it back),
 * and only "Apply import" saves. A file with any bad line is refused whole, every bad line listed.
 */
export function ImportSchedulePanel({ eventId, timeZone, zoneLabel, onClose }: ImportSchedulePanelProps) {
  const preview = useImportSchedule(eventId);
  const apply = useImportSchedule(eventId);
  const [file, setFile] = useState<File | null>(null);
  const [keys, setKeys] = useState<string[]>([]);
  const input = useRef<HTMLInputElement>(null);

  async function pick(event: ChangeEvent<HTMLInputElement>) {
    const chosen = event.target.files?.[0];
    // Cleared so that choosing the same file again, after fixing it, fires a change.
    event.target.value = '';
    if (!chosen) return;
    apply.reset();
    setFile(chosen);
    setKeys(firstKeysOf(await chosen.text()));
    preview.mutate({ file: chosen, dryRun: true });
  }

  function applyImport() {
    if (!file) return;
    apply.mutate({ file, dryRun: false }, { onSuccess: () => preview.reset() });
  }

  // A refused file lists its bad lines; any other failure (network, not a CSV) is one message.
  const refusal = [preview.error, apply.error].find((error) => badRowsOf(error) !== null) ?? null;
  const badRows = badRowsOf(refusal);
  const failure = refusal ? null : (preview.error ?? apply.error);

  return (
    <section aria-labelledby="import-title" className="flex w-full flex-col gap-4 rounded-2xl border border-line bg-surface p-5 shadow-sm">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="import-title" className="text-2xl font-bold">
          Import schedule
        </h2>
        {onClose && (
          <Button variant="quiet" onClick={onClose}>
            Close
          </Button>
        )}
      </div>
      <CsvFormatHelp zoneLabel={zoneLabel} />
      <input ref={input} type="file" accept=".csv,text/csv" className="sr-only" tabIndex={-1} aria-hidden onChange={pick} />
      <Button size="lg" className="min-h-16 text-xl" pending={preview.isPending} disabled={apply.isPending} onClick={() => input.current?.click()}>
        {file ? 'Choose another CSV file' : 'Choose a CSV file'}
      </Button>
      {file && <p className="break-all text-ink-muted">File: {file.name}</p>}

      {preview.isPending && <Loading label="Reading the file" />}
      {refusal && badRows && <ImportBadRows message={refusal.message} rows={badRows} />}
      {failure && <ErrorNotice title="The file was not read" error={uploadMessage(failure)} />}

      {preview.isSuccess && (
        <div className="flex flex-col gap-4 rounded-xl border-2 border-accent p-4">
          <p className="text-lg font-bold">Preview: nothing is saved until you apply it</p>
          <ImportCounts result={preview.data} />
          <ImportFirstRows result={preview.data} keys={keys} timeZone={timeZone} />
          <Button size="lg" icon={<CheckIcon className="size-6" />} pending={apply.isPending} onClick={applyImport}>
            Apply import
          </Button>
        </div>
      )}

      {apply.isSuccess && (
        <p role="status" className="flex items-center gap-2 text-lg font-semibold text-ok">
          <CheckIcon className="size-6" /> Imported: {apply.data.created} new, {apply.data.updated} changed, {apply.data.unchanged} unchanged.
        </p>
      )}
    </section>
  );
}

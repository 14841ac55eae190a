import { LinkButton } from '../../../components/ui/button';
import { UndoIcon } from '../../../components/ui/icons';
import { RunPanel } from './run-panel';

/** One run, full page (from the list, or a link shared between tablets). */
export function RunPage({ runId }: { runId: string }) {
  return (
    <div className="flex flex-col gap-4">
      <div>
        <LinkButton to="/checks" variant="quiet" icon={<UndoIcon className="size-5" />}>
          All checks
        </LinkButton>
      </div>
      <RunPanel runId={runId} title="h1" />
    </div>
  );
}

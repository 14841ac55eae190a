import { CHECKLIST_PHASES, PHASE_LABELS } from '@shared/domain/checklist';
import { LinkButton } from '../../../../components/ui/button';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { ChecksIcon, PlusIcon } from '../../../../components/ui/icons';
import { Loading } from '../../../../components/ui/loading';
import { PageHeader } from '../../../../components/ui/page-header';
import { useCan } from '../../../../lib/authorization';
import { useTemplates } from '../../api/get-templates';
import { TemplateCard } from './template-card';

/** Every checklist template of the team, by phase: editable for leads and mentors, readable for all. */
export function TemplatesPage() {
  const templates = useTemplates();
  const canEdit = useCan('templates:edit');

  return (
    <>
      <PageHeader
        title="Checklists"
        description="The lists the crew works through. Each run keeps the version it started with."
        actions={
          canEdit && (
            <LinkButton to="/checks/templates/new" icon={<PlusIcon />}>
              New checklist
            </LinkButton>
          )
        }
      />
      {templates.isPending && <Loading label="Loading the checklists" />}
      {templates.isError && (
        <ErrorNotice
          title="Could not load the checklists"
          error={templates.error}
          onRetry={() => templates.refetch()}
          retrying={templates.isFetching}
        />
      )}
      {templates.isSuccess && templates.data.length === 0 && (
        <div className="flex flex-col items-center gap-3 rounded-2xl border-2 border-dashed border-line p-10 text-center">
          <ChecksIcon className="size-10 text-ink-muted" />
          <p className="text-lg font-semibold">No checklists yet</p>
          <p className="text-ink-muted">
            {canEdit ? 'Write the pre-match check first: the board’s readiness light reads it.' : 'A pit lead or mentor writes them.'}
          </p>
        </div>
      )}
      {templates.isSuccess && (
        <div className="flex flex-col gap-8">
          {CHECKLIST_PHASES.map((phase) => {
            const inPhase = templates.data.filter((template) => template.phase === phase);
            if (inPhase.length === 0) return null;
            return (
              <section key={phase} aria-labelledby={`phase-${phase}`} className="flex flex-col gap-3">
                <h2 id={`phase-${phase}`} className="text-2xl font-bold">
                  {PHASE_LABELS[phase]}
                </h2>
                <ul className="grid gap-4 xl:grid-cols-2">
                  {inPhase.map((template) => (
                    <TemplateCard key={template.id} template={template} canEdit={canEdit} />
                  ))}
                </ul>
              </section>
            );
          })}
        </div>
      )}
    </>
  );
}

import { useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import type { TemplateJson } from '@shared/schemas/checks';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { Loading } from '../../../../components/ui/loading';
import { PageHeader } from '../../../../components/ui/page-header';
import { useCan } from '../../../../lib/authorization';
import { newId } from '../../../../lib/new-id';
import { useCreateTemplate } from '../../api/create-template';
import { useTemplate } from '../../api/get-template';
import { staleTemplate, useUpdateTemplate } from '../../api/update-template';
import { StaleTemplateNotice } from './stale-template-notice';
import { TemplateForm } from './template-form';
import { emptyTemplateValues, templateChanges, templateValuesOf } from './template-form-values';
import { TemplateView } from './template-view';
import { useTemplateDraft } from './use-template-draft';

const LIST = '/checks/templates';
// A card on a tablet; on a phone the item rows are the cards, and a frame around them would cost their width.
const FRAME = 'max-w-3xl sm:rounded-2xl sm:border sm:border-line sm:bg-surface sm:p-6 sm:shadow-sm';

/** Writes a new checklist (route guarded by templates:edit). */
export function NewTemplatePage() {
  const navigate = useNavigate();
  const create = useCreateTemplate();
  // Kept through failed attempts: a resend after a lost answer must not make a second template.
  const [id] = useState(newId);
  const draft = useTemplateDraft(emptyTemplateValues);

  function save() {
    const body = draft.read();
    if (body) create.mutate({ ...body, id }, { onSuccess: () => navigate(LIST) });
  }

  return (
    <>
      <PageHeader title="New checklist" description="A name, when it is used, and its items in order." />
      <div className={FRAME}>
        <TemplateForm
          values={draft.values}
          errors={draft.errorsWith(create.error)}
          onChange={draft.setValues}
          onSubmit={save}
          submitLabel="Create checklist"
          pending={create.isPending}
          saveError={create.error}
          versionNote="Later edits make new versions; a run keeps the version it started with."
        />
      </div>
    </>
  );
}

/**
 * Mounted once with the version loaded: refetches after other tablets' saves must not wipe what
 * is being typed; a conflicting save shows theirs beside it instead.
 */
function EditTemplateForm({ template }: { template: TemplateJson }) {
  const navigate = useNavigate();
  const update = useUpdateTemplate();
  const [base, setBase] = useState(template);
  const [formKey, setFormKey] = useState(0);
  const draft = useTemplateDraft(() => templateValuesOf(template));
  const theirs = staleTemplate(update.error);
  // Said early, while the user is still typing; the conflict itself is settled when they save.
  const latest = useTemplate(template.id).data;
  const newerSaved = latest && latest.version > base.version && !theirs && !update.isPending && !update.isSuccess ? latest : null;

  function save(version: number) {
    const body = draft.read();
    if (!body) return;
    // Against the version the user started from: a rename must not resend (and so replace) the items.
    const changes = templateChanges(base, body);
    if (Object.keys(changes).length === 0) return navigate(LIST);
    update.mutate({ id: template.id, changes: { ...changes, version } }, { onSuccess: () => navigate(LIST) });
  }

  function takeTheirs(saved: TemplateJson) {
    update.reset();
    setBase(saved);
    draft.reset(templateValuesOf(saved));
    // Folded rows and the undo of a removal belonged to the user's draft.
    setFormKey((key) => key + 1);
  }

  return (
    <>
      {newerSaved && (
        <p role="status" className="mb-5 rounded-xl border-2 border-warning bg-warning-soft p-4 font-semibold">
          Version {newerSaved.version} was just saved{newerSaved.updatedBy && ` by ${newerSaved.updatedBy.name}`}. Your edits are kept; when you
          save you will see what they changed and choose.
        </p>
      )}
      <TemplateForm
        key={formKey}
        values={draft.values}
        errors={draft.errorsWith(theirs ? null : update.error)}
        onChange={draft.setValues}
        onSubmit={() => save(base.version)}
        submitLabel="Save changes"
        pending={update.isPending}
        saveError={theirs ? null : update.error}
        versionNote={`Saving makes version ${base.version + 1}. Runs already started keep the version they began with.`}
        notice={
          theirs && (
            <StaleTemplateNotice
              base={base}
              theirs={theirs}
              pending={update.isPending}
              onKeepMine={() => save(theirs.version)}
              onTakeTheirs={() => takeTheirs(theirs)}
            />
          )
        }
      />
    </>
  );
}

/** A checklist: its editor for leads and mentors, a read-only view for everyone else. */
export function EditTemplatePage() {
  const { templateId = '' } = useParams();
  const template = useTemplate(templateId);
  const canEdit = useCan('templates:edit');

  if (template.isSuccess && !canEdit) return <TemplateView template={template.data} />;
  return (
    <>
      <PageHeader title={canEdit ? 'Edit checklist' : 'Checklist'} description={template.data?.name} />
      <div className={FRAME}>
        {template.isPending && <Loading label="Loading the checklist" />}
        {template.isError && (
          <ErrorNotice
            title="Could not load the checklist"
            error={template.error}
            onRetry={() => template.refetch()}
            retrying={template.isFetching}
          />
        )}
        {template.isSuccess && <EditTemplateForm template={template.data} />}
      </div>
    </>
  );
}

import { useState } from 'react';
import type { TemplateJson } from '@shared/schemas/checks';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PlusIcon } from '../../../components/ui/icons';
import { newId } from '../../../lib/new-id';
import { useCreateRun } from '../api/create-run';

/** One button per template: its id is kept across taps, so a resend after a lost answer finds the same run. */
function StartButton({ eventId, matchId, template }: { eventId: string; matchId: string; template: TemplateJson }) {
  const create = useCreateRun(eventId);
  const [id] = useState(newId);
  return (
    <div className="flex flex-col gap-2">
      <Button
        size="lg"
        className="min-h-16 text-xl"
        icon={<PlusIcon className="size-7" />}
        pending={create.isPending}
        onClick={() => create.mutate({ id, templateId: template.id, matchId })}
      >
        Start {template.name}
      </Button>
      {create.isError && <ErrorNotice title={`${template.name} was not started`} error={create.error} />}
    </div>
  );
}

/**
 * Pre-match checks start by themselves when the field reaches our previous match; this starts
 * the missing ones on demand (our first match, or a lead who wants to begin early).
 */
export function StartPreMatch({ eventId, matchId, templates }: { eventId: string; matchId: string; templates: TemplateJson[] }) {
  return (
    <div className="flex flex-wrap gap-3">
      {templates.map((template) => (
        <StartButton key={template.id} eventId={eventId} matchId={matchId} template={template} />
      ))}
    </div>
  );
}

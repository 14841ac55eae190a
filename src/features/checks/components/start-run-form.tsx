import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import { CHECKLIST_PHASES, PHASE_LABELS, type ChecklistPhase } from '@shared/domain/checklist';
import type { TemplateJson } from '@shared/schemas/checks';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { SelectField } from '../../../components/ui/field';
import { PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { matchName } from '../../../lib/match-labels';
import { newId } from '../../../lib/new-id';
import { useCreateRun } from '../api/create-run';
import { useTemplates } from '../api/get-templates';
import type { CheckMatch } from './check-match';

const NO_MATCH = '';

/** The match a run of this phase most likely belongs to: the next one before it, the one just played after it. */
function likelyMatch(phase: ChecklistPhase, next: CheckMatch | null, ours: CheckMatch[]): string {
  if (phase === 'pre_match') return next?.id ?? NO_MATCH;
  if (phase === 'post_match') return ours.filter((match) => match.started).at(-1)?.id ?? NO_MATCH;
  return NO_MATCH;
}

function StartRunFields({ eventId, templates, nextMatch, ourMatches, onCancel }: {
  eventId: string;
  templates: TemplateJson[];
  nextMatch: CheckMatch | null;
  ourMatches: CheckMatch[];
  onCancel: () => void;
}) {
  const navigate = useNavigate();
  const create = useCreateRun(eventId);
  // One id per form, kept through failed attempts: a resend finds the run instead of adding one.
  const [id] = useState(newId);
  const [templateId, setTemplateId] = useState(templates[0]?.id ?? '');
  const [matchId, setMatchId] = useState(() => (templates[0] ? likelyMatch(templates[0].phase, nextMatch, ourMatches) : NO_MATCH));
  const [matchTouched, setMatchTouched] = useState(false);

  function pickTemplate(value: string) {
    setTemplateId(value);
    const template = templates.find((candidate) => candidate.id === value);
    if (template && !matchTouched) setMatchId(likelyMatch(template.phase, nextMatch, ourMatches));
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    create.mutate({ id, templateId, matchId: matchId || null }, { onSuccess: (run) => navigate(`/checks/runs/${run.id}`) });
  }

  return (
    <form noValidate onSubmit={submit} aria-label="Start a checklist" className="flex flex-col gap-4 rounded-2xl bg-sunken p-4">
      {create.isError && <ErrorNotice title="The checklist was not started" error={create.error} />}
      <SelectField label="Checklist" value={templateId} onChange={(event) => pickTemplate(event.target.value)}>
        {CHECKLIST_PHASES.map((phase) => {
          const ofPhase = templates.filter((template) => template.phase === phase);
          return (
            ofPhase.length > 0 && (
              <optgroup key={phase} label={PHASE_LABELS[phase]}>
                {ofPhase.map((template) => (
                  <option key={template.id} value={template.id}>
                    {template.name}
                  </option>
                ))}
              </optgroup>
            )
          );
        })}
      </SelectField>
      <SelectField
        label="For a match (optional)"
        hint="One run per checklist and match: if it exists already, it opens."
        value={matchId}
        onChange={(event) => {
          setMatchTouched(true);
          setMatchId(event.target.value);
        }}
      >
        <option value={NO_MATCH}>No match</option>
        {ourMatches.map((match) => (
          <option key={match.id} value={match.id}>
            {matchName(match.level, match.number)}
            {match.id === nextMatch?.id ? ' (next)' : match.started ? ' (played)' : ''}
          </option>
        ))}
      </SelectField>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="lg" icon={<PlusIcon />} pending={create.isPending}>
          Start
        </Button>
        <Button variant="secondary" size="lg" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** "Start a checklist": any template, for one of our matches or none (inspection, pack-out). */
export function StartRunForm(props: { eventId: string; nextMatch: CheckMatch | null; ourMatches: CheckMatch[]; onCancel: () => void }) {
  const templates = useTemplates();
  if (templates.isPending) return <Loading label="Loading the checklists" />;
  if (templates.isError) {
    return <ErrorNotice title="Could not load the checklists" error={templates.error} onRetry={() => templates.refetch()} retrying={templates.isFetching} />;
  }
  if (templates.data.length === 0) return <p className="text-lg text-ink-muted">There are no checklists yet: a lead writes them under Checklists.</p>;
  return <StartRunFields {...props} templates={templates.data} />;
}

import { alertRuleFor, isEscalation } from '@shared/domain/incident-alert';
import { classifyIncident, immediateAlertReasons, type IncidentClassification, type IncidentKind, type TreatmentCode } from '@shared/domain/incident-classification';
import { FirstThingsFirst } from '../../../components/ui/first-things-first';
import { ClassTag } from './class-tag';
import { basisText, listWords, REASON_LABELS } from './incident-words';

/** Who hears of a report when it is sent: the alert rules are the team's, so the words say whose rule decides. */
export function whoIsTold(kind: IncidentKind, treatments: readonly TreatmentCode[]): string {
  const rule = alertRuleFor({ kind, treatments });
  if (rule === 'immediate') {
    const reasons = immediateAlertReasons({ kind, treatments }).map((reason) => REASON_LABELS[reason]);
    return `The safety contacts get an e-mail at once when you send this, because of ${listWords(reasons)}.`;
  }
  if (rule === 'first_aid_only') return 'The safety contacts for first aid get an e-mail when you send this (the safety captains and mentors, unless the team changed its alert rules).';
  return 'The safety captains and mentors will read it in the log. Near misses are e-mailed only if the team asked for them.';
}

function ClassLine({ classification }: { classification: IncidentClassification }) {
  return (
    <div className="flex flex-col items-start gap-2">
      <ClassTag incidentClass={classification.class} />
      <p>{basisText(classification)}</p>
    </div>
  );
}

type Facts = { kind: IncidentKind; treatments: readonly TreatmentCode[] };

/** For an edit: whether saving alerts anyone, which it does only when the report became more serious. */
function whoIsToldOnSave(before: Facts, after: Facts): string {
  if (!isEscalation(alertRuleFor(before), alertRuleFor(after))) return 'Saving sends no new e-mail: the report is no more serious than when it was reported.';
  return `Saving makes it more serious than when it was reported. ${whoIsTold(after.kind, after.treatments).replace('when you send this', 'when you save')}`;
}

/** The live class of the report being written, and who will be told, before it is sent (or, for an edit, saved). */
export function ClassificationPreview({ kind, treatments, before }: { kind: IncidentKind | ''; treatments: readonly TreatmentCode[]; before?: Facts }) {
  return (
    <section aria-labelledby="class-preview-title" className="flex flex-col gap-3 rounded-2xl border-2 border-line-strong bg-surface p-4 sm:p-5">
      <h2 id="class-preview-title" className="text-xl font-bold">
        How it is classed
      </h2>
      {/* Polite: the class changes with each tick, and a screen reader should hear where it landed. */}
      <div aria-live="polite" className="flex flex-col gap-3 text-lg">
        {kind === '' ? (
          <p className="text-ink-muted">Tap what kind of incident it was and tick the care given; the class shows here.</p>
        ) : (
          <>
            <ClassLine classification={classifyIncident({ kind, treatments })} />
            <p className="font-semibold">{before ? whoIsToldOnSave(before, { kind, treatments }) : whoIsTold(kind, treatments)}</p>
          </>
        )}
      </div>
      <FirstThingsFirst />
    </section>
  );
}

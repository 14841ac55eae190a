import { useState } from 'react';
import { SIGN_OFF_REASON_MIN, type RunJson } from '@shared/schemas/checks';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, Field } from '../../../components/ui/field';
import { AlertIcon, CheckIcon } from '../../../components/ui/icons';
import { RelativeTime } from '../../../components/ui/relative-time';
import { isApiError } from '../../../lib/api-client';
import { useCan } from '../../../lib/authorization';
import { useSignOffRun } from '../api/sign-off-run';

/** Who signed the run off, when, and why when items were open. */
function SignedOff({ signOff, complete, now }: { signOff: NonNullable<RunJson['signOff']>; complete: boolean; now: Date }) {
  return (
    <div className={`flex flex-col gap-1 rounded-xl border-2 p-4 ${complete ? 'border-ok bg-ok-soft' : 'border-warning bg-warning-soft'}`}>
      <p className="flex flex-wrap items-center gap-2 text-lg font-bold">
        {complete ? <CheckIcon className="size-6 text-ok" /> : <AlertIcon className="size-6 text-warning" />}
        Signed off by {signOff.by.name} · <RelativeTime at={signOff.at} now={now} />
      </p>
      {signOff.reason && <p className="text-lg">“{signOff.reason}”</p>}
    </div>
  );
}

/**
 * The lead's sign-off. A complete run is signed off with one tap; with items open the dialog
 * lists them and asks why it is done anyway (the reason stays on the run).
 */
export function SignOff({ run, now }: { run: RunJson; now: Date }) {
  const canSignOff = useCan('checks:sign-off');
  const signOff = useSignOffRun(run.id);
  const [asking, setAsking] = useState(false);
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  if (run.signOff) return <SignedOff signOff={run.signOff} complete={run.complete} now={now} />;
  if (!canSignOff) return null;

  const open = run.items.filter((item) => item.failed || (item.required && !item.done));
  const serverProblem = isApiError(signOff.error) ? signOff.error.fields.reason : undefined;

  function send() {
    const written = reason.trim();
    if (written.length < SIGN_OFF_REASON_MIN) {
      setProblem(`Say in a few words why (at least ${SIGN_OFF_REASON_MIN} characters)`);
      return;
    }
    setProblem(null);
    signOff.mutate({ reason: written }, { onSuccess: () => setAsking(false) });
  }

  return (
    <div className="flex flex-col gap-3">
      {run.complete ? (
        <Button size="lg" icon={<CheckIcon />} pending={signOff.isPending} onClick={() => signOff.mutate({ reason: null })}>
          Sign off as done
        </Button>
      ) : (
        <Button
          variant="secondary"
          size="lg"
          icon={<AlertIcon />}
          onClick={() => {
            signOff.reset();
            setProblem(null);
            setAsking(true);
          }}
        >
          Sign off with items open…
        </Button>
      )}
      {!asking && signOff.isError && <ErrorNotice title="Not signed off" error={signOff.error} />}
      <Dialog
        open={asking}
        title={`Sign off ${run.name} with ${open.length} ${open.length === 1 ? 'item' : 'items'} open?`}
        onClose={() => setAsking(false)}
        actions={
          <>
            <Button variant="secondary" onClick={() => setAsking(false)}>
              Keep checking
            </Button>
            <Button variant="danger" pending={signOff.isPending} onClick={send}>
              Sign off anyway
            </Button>
          </>
        }
      >
        <ul className="list-disc pl-6 text-lg">
          {open.map((item) => (
            <li key={item.id}>
              {item.label}
              {item.failed && <span className="font-semibold text-danger"> (failed)</span>}
            </li>
          ))}
        </ul>
        <Field label="Why sign it off anyway?" error={problem ?? serverProblem} hint="Kept on the run; for a pre-match check, also shown with the readiness.">
          {(control) => (
            <textarea rows={3} maxLength={500} className={controlClass} value={reason} onChange={(event) => setReason(event.target.value)} {...control} />
          )}
        </Field>
        {signOff.isError && !serverProblem && <ErrorNotice title="Not signed off" error={signOff.error} />}
      </Dialog>
    </div>
  );
}

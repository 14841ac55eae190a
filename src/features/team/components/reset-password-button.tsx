import { useState } from 'react';
import type { CreatedMemberJson, MemberJson } from '@shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { useUpdateMember } from '../api/update-member';
import { TemporaryPasswordDialog } from './temporary-password-dialog';

/** For a member who forgot their password: a mentor hands them a new temporary one. */
export function ResetPasswordButton({ member }: { member: MemberJson }) {
  const reset = useUpdateMember();
  const [confirming, setConfirming] = useState(false);
  const [result, setResult] = useState<CreatedMemberJson | null>(null);

  function confirm() {
    reset.mutate(
      { id: member.id, resetPassword: true },
      {
        onSuccess: (answer) => {
          setConfirming(false);
          setResult(answer as CreatedMemberJson);
        },
      },
    );
  }

  return (
    <>
      <Button
        variant="secondary"
        onClick={() => {
          reset.reset();
          setConfirming(true);
        }}
      >
        Reset password
      </Button>
      <Dialog
        open={confirming}
        title={`Reset the password of ${member.name}?`}
        onClose={() => setConfirming(false)}
        actions={
          <>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
            <Button pending={reset.isPending} onClick={confirm}>
              Make a new password
            </Button>
          </>
        }
      >
        <p>
          Their current password stops working and they are signed out on every device. You get a new temporary
          password to hand over in person.
        </p>
        {reset.isError && <ErrorNotice error={reset.error} />}
      </Dialog>
      <TemporaryPasswordDialog member={result} reason="reset" onClose={() => setResult(null)} />
    </>
  );
}

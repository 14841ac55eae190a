import type { ReactNode } from 'react';
import { Button } from './button';
import { AlertIcon } from './icons';

interface StaleNoticeProps {
  /** What was changed, e.g. "this match". */
  what: string;
  intro: string;
  pending: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  /** Their saved values. */
  children: ReactNode;
  keepMineLabel?: string;
  takeTheirsLabel?: string;
}

/**
 * Someone else saved a record while it was open here (a 409 `stale`): their values, and the two
 * ways on. The user's own input stays in the form below; nothing is lost either way.
 */
export function StaleNotice({ what, intro, pending, onKeepMine, onTakeTheirs, children, keepMineLabel = 'Save mine over theirs', takeTheirsLabel = 'Use their version' }: StaleNoticeProps) {
  return (
    <div role="alert" className="flex flex-col gap-3 rounded-xl border-2 border-warning bg-warning-soft p-4 text-ink">
      <p className="flex items-center gap-2 text-lg font-bold">
        <AlertIcon className="size-6 text-warning" /> Someone else changed {what}
      </p>
      <p>{intro}</p>
      {children}
      <div className="flex flex-wrap gap-3">
        <Button pending={pending} onClick={onKeepMine}>
          {keepMineLabel}
        </Button>
        <Button variant="secondary" onClick={onTakeTheirs}>
          {takeTheirsLabel}
        </Button>
      </div>
    </div>
  );
}

import type { ReactNode } from 'react';
import type { BatteryStatus, HealthStatus } from '@shared/domain/battery-state';
import { CheckIcon, ClockIcon, RobotIcon } from '../../../components/ui/icons';
import { StatusTag } from '../../../components/ui/status-tag';
import { BoltIcon, EmptyIcon, EyeIcon, RetiredIcon, StopIcon } from './battery-icons';
import { HEALTH_WORDS, STATUS_WORDS } from './battery-format';

type Tone = 'ok' | 'warning' | 'danger' | 'accent' | 'neutral';

const HEALTH_LOOK: Record<HealthStatus, { tone: Tone; icon: ReactNode }> = {
  good: { tone: 'ok', icon: <CheckIcon className="size-4" strokeWidth={3} /> },
  watch: { tone: 'warning', icon: <EyeIcon className="size-4" /> },
  replace: { tone: 'danger', icon: <StopIcon className="size-4" /> },
};

/** Health as word + icon shape + colour: ✓ Good, an eye for Watch, an octagon for Replace. */
export function HealthTag({ status }: { status: HealthStatus }) {
  const look = HEALTH_LOOK[status];
  return (
    <StatusTag tone={look.tone} icon={look.icon}>
      {HEALTH_WORDS[status]}
    </StatusTag>
  );
}

const STATUS_LOOK: Record<BatteryStatus, { tone: Tone; icon: ReactNode }> = {
  ready: { tone: 'ok', icon: <CheckIcon className="size-4" strokeWidth={3} /> },
  charging: { tone: 'accent', icon: <BoltIcon className="size-4" /> },
  in_robot: { tone: 'accent', icon: <RobotIcon className="size-4" /> },
  spent: { tone: 'warning', icon: <EmptyIcon className="size-4" /> },
  resting: { tone: 'neutral', icon: <ClockIcon className="size-4" /> },
  retired: { tone: 'neutral', icon: <RetiredIcon className="size-4" /> },
};

/** Where the battery is in its cycle, as word + icon + colour. */
export function BatteryStatusTag({ status }: { status: BatteryStatus }) {
  const look = STATUS_LOOK[status];
  return (
    <StatusTag tone={look.tone} icon={look.icon}>
      {STATUS_WORDS[status]}
    </StatusTag>
  );
}

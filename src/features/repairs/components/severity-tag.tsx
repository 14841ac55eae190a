import type { RepairSeverity } from '@shared/domain/repair-urgency';
import { AlertIcon, DotIcon, OctagonIcon } from '../../../components/ui/icons';
import { StatusTag } from '../../../components/ui/status-tag';
import { SEVERITY_WORDS } from './repair-words';

const LOOK = {
  blocks_match: { tone: 'danger', Icon: OctagonIcon },
  degraded: { tone: 'warning', Icon: AlertIcon },
  cosmetic: { tone: 'neutral', Icon: DotIcon },
} as const;

/** Severity as word + shape + colour: an octagon blocks the match, a triangle degrades it, a circle is cosmetic. */
export function SeverityTag({ severity }: { severity: RepairSeverity }) {
  const { tone, Icon } = LOOK[severity];
  return (
    <StatusTag tone={tone} icon={<Icon className="size-4" strokeWidth={2.5} />}>
      {SEVERITY_WORDS[severity]}
    </StatusTag>
  );
}

/** The severity's shape alone, for a list that names the severity in words elsewhere. */
export function SeverityIcon({ severity, className = 'size-5' }: { severity: RepairSeverity; className?: string }) {
  const { Icon } = LOOK[severity];
  return <Icon className={className} strokeWidth={2.5} />;
}

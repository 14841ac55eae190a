import type { IncidentClass } from '@shared/domain/incident-classification';
import { AlertIcon, DotIcon } from '../../../components/ui/icons';
import { FirstAidIcon } from '../../../components/ui/safety-icons';
import { StatusTag } from '../../../components/ui/status-tag';
import { CLASS_LABELS } from './incident-words';

// Shape, word and colour: a hollow circle, a first-aid cross, a warning triangle.
const LOOKS = {
  near_miss: { tone: 'neutral', icon: DotIcon },
  first_aid_only: { tone: 'warning', icon: FirstAidIcon },
  beyond_first_aid: { tone: 'danger', icon: AlertIcon },
} as const;

/** An incident's class as a tag: never colour alone. */
export function ClassTag({ incidentClass }: { incidentClass: IncidentClass }) {
  const { tone, icon: Icon } = LOOKS[incidentClass];
  return (
    <StatusTag large tone={tone} icon={<Icon className="size-5" />}>
      {CLASS_LABELS[incidentClass]}
    </StatusTag>
  );
}

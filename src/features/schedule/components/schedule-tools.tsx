import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ScheduleIcon } from '../../../components/ui/icons';
import { AddMatchPanel } from './add-match-panel';
import { ImportSchedulePanel } from './import-schedule-panel';

interface ScheduleToolsProps {
  eventId: string;
  timeZone: string;
  zoneLabel: string;
  defaultDate: string;
  /** With no matches yet the import is the only thing to do here: show it open. */
  startOpen?: boolean;
}

/** The lead's schedule changes: import a file, or add one match by hand. */
export function ScheduleTools({ eventId, timeZone, zoneLabel, defaultDate, startOpen = false }: ScheduleToolsProps) {
  const [importing, setImporting] = useState(startOpen);
  return (
    <div className="flex flex-wrap items-start gap-3">
      {importing ? (
        <ImportSchedulePanel eventId={eventId} timeZone={timeZone} zoneLabel={zoneLabel} onClose={startOpen ? undefined : () => setImporting(false)} />
      ) : (
        <Button variant="secondary" size="lg" icon={<ScheduleIcon className="size-6" />} onClick={() => setImporting(true)}>
          Import schedule
        </Button>
      )}
      <AddMatchPanel eventId={eventId} timeZone={timeZone} zoneLabel={zoneLabel} defaultDate={defaultDate} />
    </div>
  );
}

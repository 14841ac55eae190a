import { AlertIcon } from './icons';

/**
 * What an incident's class and the safety log are, and what they are not: said wherever a class
 * is shown (the safety area, the alert rules), so nobody takes the team's record for the event's
 * or a doctor's word.
 */
export function FirstThingsFirst() {
  return (
    <p className="flex items-start gap-3 rounded-xl bg-sunken p-3 font-semibold">
      <AlertIcon className="mt-0.5 size-6" />
      <span>
        Local rules, event staff and licensed medical advice come first. The classification here is the team&apos;s own, for its records and alerts: it is not an official
        log.
      </span>
    </p>
  );
}

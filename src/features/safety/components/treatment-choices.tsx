import { BEYOND_FIRST_AID_TREATMENTS, FIRST_AID_TREATMENTS, LOSS_OF_CONSCIOUSNESS, TREATMENT_LABELS, type TreatmentCode } from '@shared/domain/incident-classification';
import { Checkbox, CheckboxGroup } from '../../../components/ui/checkbox';

const GROUPS: { legend: string; codes: readonly TreatmentCode[] }[] = [
  { legend: 'First aid', codes: FIRST_AID_TREATMENTS },
  { legend: 'Beyond first aid', codes: BEYOND_FIRST_AID_TREATMENTS },
  { legend: 'Lost consciousness', codes: [LOSS_OF_CONSCIOUSNESS] },
];

/** The care given, as large ticks in plain words; the class is read from these, never chosen. */
export function TreatmentChoices({ value, onChange, error }: { value: TreatmentCode[]; onChange: (codes: TreatmentCode[]) => void; error?: string }) {
  const toggle = (code: TreatmentCode, on: boolean) => onChange(on ? [...value, code] : value.filter((other) => other !== code));
  return (
    <section aria-labelledby="care-title" className="flex flex-col gap-4">
      <div>
        <h2 id="care-title" className="text-xl font-bold">
          Care given
        </h2>
        <p className="text-ink-muted">Tick everything that was done. Nothing ticked means nobody needed care.</p>
      </div>
      {GROUPS.map((group) => (
        <CheckboxGroup key={group.legend} legend={group.legend}>
          {group.codes.map((code) => (
            <Checkbox key={code} label={TREATMENT_LABELS[code]} checked={value.includes(code)} onChange={(event) => toggle(code, event.target.checked)} />
          ))}
        </CheckboxGroup>
      ))}
      {error && <p className="font-semibold text-danger">{error}</p>}
    </section>
  );
}

import { describeLimits, PHASE_LABELS } from '@shared/domain/checklist';
import type { TemplateJson } from '@shared/schemas/checks';
import { LinkButton } from '../../../../components/ui/button';
import { Card } from '../../../../components/ui/card';
import { PageHeader } from '../../../../components/ui/page-header';
import { ItemTags } from './item-tags';
import { VersionLine } from './version-line';

/** A checklist for those who do the checks but do not write them. */
export function TemplateView({ template }: { template: TemplateJson }) {
  return (
    <>
      <PageHeader title={template.name} description={<>{PHASE_LABELS[template.phase]} · <VersionLine template={template} /></>} />
      <Card className="max-w-3xl">
        <ol className="flex flex-col divide-y-2 divide-line">
          {template.items.map((item, index) => (
            <li key={item.id} className="flex gap-3 py-3 first:pt-0 last:pb-0">
              <span className="w-7 shrink-0 text-right text-lg font-bold tabular-nums text-ink-muted">{index + 1}</span>
              <div className="flex min-w-0 flex-1 flex-col gap-1.5">
                <p className="font-semibold break-words">{item.label}</p>
                {item.help && <p className="text-ink-muted">{item.help}</p>}
                <ItemTags
                  kind={item.kind}
                  required={item.required}
                  limits={describeLimits(item)}
                  options={item.options}
                  role={item.role}
                  bumperColour={item.purpose === 'bumper_colour'}
                />
              </div>
            </li>
          ))}
        </ol>
      </Card>
      <div className="mt-4 flex flex-wrap items-center gap-x-6 gap-y-3">
        <LinkButton to="/checks/templates" variant="secondary">
          All checklists
        </LinkButton>
        <p className="text-ink-muted">Pit leads and mentors edit checklists.</p>
      </div>
    </>
  );
}

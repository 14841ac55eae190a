import { Link } from 'react-router';
import type { TemplateJson } from '@shared/schemas/checks';
import { ChecksIcon } from '../../../../components/ui/icons';
import { VersionLine } from './version-line';

/** One template in the list; the whole card opens it. */
export function TemplateCard({ template, canEdit }: { template: TemplateJson; canEdit: boolean }) {
  const required = template.items.filter((item) => item.required).length;
  const count = template.items.length;
  return (
    <li className="relative flex flex-col gap-2 rounded-2xl border-2 border-line bg-surface p-5 hover:border-accent has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-focus">
      <h3 className="flex items-start justify-between gap-3 text-xl font-bold">
        <Link to={`/checks/templates/${template.id}`} className="break-words after:absolute after:inset-0 after:rounded-2xl focus-visible:outline-none">
          {template.name}
        </Link>
        <span aria-hidden="true" className="shrink-0 text-base font-semibold text-accent-ink">
          {canEdit ? 'Edit' : 'View'}
        </span>
      </h3>
      <p className="flex items-center gap-2 tabular-nums">
        <ChecksIcon className="size-5 text-ink-muted" />
        {count} {count === 1 ? 'item' : 'items'}, {required} required
      </p>
      <p className="text-ink-muted">
        <VersionLine template={template} />
      </p>
    </li>
  );
}

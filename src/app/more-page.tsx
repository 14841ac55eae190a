import { Link } from 'react-router';
import { PageHeader } from '../components/ui/page-header';
import { useNavItems } from './app-nav';

/** The areas a phone's bottom bar has no room for, as big links; every area is listed on wider screens' navigation. */
export function MorePage() {
  const items = useNavItems().filter((item) => !item.primary);
  return (
    <>
      <PageHeader title="More" description="The other parts of Pitwright." />
      {items.length === 0 ? (
        <p className="text-lg text-ink-muted">Every area open to your role is in the bar below.</p>
      ) : (
        <ul className="grid max-w-3xl gap-3 sm:grid-cols-2">
          {items.map(({ to, label, icon: Icon }) => (
            <li key={to}>
              <Link
                to={to}
                className="flex min-h-20 items-center gap-4 rounded-2xl border-2 border-line-strong bg-surface px-5 text-2xl font-bold hover:bg-sunken active:bg-sunken"
              >
                <Icon className="size-9 text-accent-ink" />
                {label}
              </Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

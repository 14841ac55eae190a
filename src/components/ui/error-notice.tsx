import { isApiError } from '../../lib/api-client';
import { Button } from './button';
import { AlertIcon } from './icons';

export function errorMessage(error: unknown): string {
  if (isApiError(error) || error instanceof Error) return error.message;
  return 'Something went wrong.';
}

interface ErrorNoticeProps {
  error: unknown;
  /** What failed, e.g. "Could not load the events". */
  title?: string;
  onRetry?: () => void;
  retrying?: boolean;
}

/** Says why something failed and, for reads, offers to try again. */
export function ErrorNotice({ error, title, onRetry, retrying = false }: ErrorNoticeProps) {
  return (
    <div role="alert" className="flex flex-wrap items-start gap-3 rounded-xl border-2 border-danger bg-danger-soft p-4 text-ink">
      <AlertIcon className="mt-0.5 size-6 text-danger" />
      <div className="min-w-0 flex-1 basis-48">
        {title && <p className="font-bold">{title}</p>}
        <p>{errorMessage(error)}</p>
      </div>
      {onRetry && (
        <Button variant="secondary" onClick={onRetry} pending={retrying}>
          {retrying ? 'Retrying' : 'Retry'}
        </Button>
      )}
    </div>
  );
}

import { isRouteErrorResponse, useRevalidator, useRouteError } from 'react-router';
import { LinkButton } from '../components/ui/button';
import { ErrorNotice } from '../components/ui/error-notice';

/** What a route shows when its loader or its page threw, instead of a blank screen. */
export function RouteError() {
  const error = useRouteError();
  const revalidator = useRevalidator();

  if (isRouteErrorResponse(error) && error.status === 404) return <NotFound />;
  return (
    <div className="mx-auto flex max-w-2xl flex-col gap-4 px-4 py-10">
      <h1 className="text-3xl font-bold">This page could not open</h1>
      <ErrorNotice
        error={isRouteErrorResponse(error) ? new Error(error.statusText) : error}
        onRetry={() => revalidator.revalidate()}
        retrying={revalidator.state === 'loading'}
      />
    </div>
  );
}

export function NotFound() {
  return (
    <div className="flex flex-col items-start gap-4">
      <h1 className="text-3xl font-bold">Nothing here</h1>
      <p className="text-lg text-ink-muted">This address is not a page of Pitwright. It may be from an older link.</p>
      <LinkButton to="/">Back to the board</LinkButton>
    </div>
  );
}

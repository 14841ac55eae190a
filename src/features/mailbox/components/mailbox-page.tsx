import { Link, useSearchParams } from 'react-router';
import type { MailboxMessageJson } from '@shared/schemas/mail';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/dates';
import { useMailbox } from '../api/get-mailbox';
import { MessageView } from './message-view';

function MessageList({ messages, selectedId }: { messages: MailboxMessageJson[]; selectedId: string | null }) {
  return (
    <ul aria-label="Messages" className="flex flex-col gap-2">
      {messages.map((message) => {
        const selected = message.id === selectedId;
        return (
          <li key={message.id}>
            <Link
              to={{ search: `?message=${encodeURIComponent(message.id)}` }}
              aria-current={selected ? 'true' : undefined}
              className={`flex min-h-16 flex-col gap-0.5 rounded-xl border-2 px-4 py-3 ${
                selected ? 'border-accent bg-accent-soft' : 'border-line bg-surface hover:bg-sunken active:bg-sunken'
              }`}
            >
              <span className="text-lg font-bold break-words">{message.subject || '(no subject)'}</span>
              <span className="break-all">To {message.to}</span>
              <span className="text-sm text-ink-muted tabular-nums">{formatDateTime(message.receivedAt)}</span>
            </Link>
          </li>
        );
      })}
    </ul>
  );
}

/**
 * `/mailbox`: while the local SMTP fake stands in for a mail server, the mail it caught for this
 * team (invites, new-password links, incident alerts), so a demo or a test can follow the links.
 */
export function MailboxPage() {
  const mailbox = useMailbox();
  const [searchParams] = useSearchParams();
  const messages = mailbox.data?.messages ?? [];
  const selected = messages.find((message) => message.id === searchParams.get('message')) ?? null;

  return (
    <>
      <PageHeader
        title="Mailbox"
        description="Mail for this team that the built-in mail catcher received. None of it left this server."
      />
      {mailbox.isPending && <Loading label="Loading the mail" />}
      {isApiError(mailbox.error, 'mailbox_off') ? (
        <p className="max-w-2xl text-lg">
          There is no mailbox here: this server sends mail through a real mail server, so each message is in the inbox
          of its address.
        </p>
      ) : (
        mailbox.isError && <ErrorNotice title="Could not load the mail" error={mailbox.error} onRetry={() => mailbox.refetch()} retrying={mailbox.isFetching} />
      )}
      {mailbox.isSuccess &&
        (messages.length === 0 ? (
          <p className="text-lg">No mail yet. Invites, new-password links and incident alerts for this team show up here.</p>
        ) : (
          <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
            {/* Narrower than a landscape tablet, the open message takes the page; the list is one tap back. */}
            <div className={selected ? 'max-lg:hidden' : ''}>
              <MessageList messages={messages} selectedId={selected?.id ?? null} />
            </div>
            {selected ? (
              <MessageView message={selected} />
            ) : (
              <p className="text-lg text-ink-muted max-lg:hidden">Choose a message to read it.</p>
            )}
          </div>
        ))}
    </>
  );
}

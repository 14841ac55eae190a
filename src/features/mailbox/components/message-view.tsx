import type { MailboxMessageJson } from '@shared/schemas/mail';
import { LinkButton } from '../../../components/ui/button';
import { formatDateTime } from '../../../lib/dates';
import { MessageText } from './message-text';

export function MessageView({ message }: { message: MailboxMessageJson }) {
  return (
    <article aria-labelledby="message-subject" className="flex min-w-0 flex-col gap-4 rounded-2xl border border-line bg-surface p-5 shadow-sm sm:p-6">
      <LinkButton to={{ search: '' }} variant="secondary" className="self-start lg:hidden">
        All messages
      </LinkButton>
      <h2 id="message-subject" className="text-2xl font-bold break-words">
        {message.subject || '(no subject)'}
      </h2>
      <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-1">
        <dt className="font-semibold">To</dt>
        <dd className="break-all">{message.to}</dd>
        <dt className="font-semibold">Received</dt>
        <dd className="tabular-nums">{formatDateTime(message.receivedAt)}</dd>
      </dl>
      <MessageText text={message.text} />
    </article>
  );
}

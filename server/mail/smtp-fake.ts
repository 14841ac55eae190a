import { simpleParser } from 'mailparser';
import { SMTPServer, type SMTPServerSession } from 'smtp-server';

export const FAKE_MAX_BYTES = 2 * 1024 * 1024;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export interface ReceivedMail {
  /** From the X-Pitwright-Team header; null for mail that did not come from Pitwright. */
  teamId: string | null;
  from: string;
  /** The envelope recipients: who the message was delivered to, Bcc included. */
  to: string[];
  subject: string;
  text: string;
  receivedAt: Date;
}

export interface SmtpFake {
  port: number;
  close(): Promise<void>;
}

/**
 * A local SMTP server that accepts every message and hands it to `store`: the stand-in for a
 * mail relay at an event without internet. Plain SMTP on the loopback only, no auth, no TLS.
 */
export async function startSmtpFake({ host, port, store }: { host: string; port: number; store: (mail: ReceivedMail) => Promise<void> }): Promise<SmtpFake> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: FAKE_MAX_BYTES,
    rejectOversized: true,
    logger: false,
    banner: 'Pitwright SMTP fake',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          // smtp-server answers 552 itself (rejectOversized); nothing of the message is kept.
          if (stream.sizeExceeded) return callback();
          const header = parsed.headers.get('x-pitwright-team');
          await store({
            teamId: typeof header === 'string' && UUID.test(header.trim()) ? header.trim().toLowerCase() : null,
            from: parsed.from?.text || envelopeSender(session),
            to: session.envelope.rcptTo.map((recipient) => recipient.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            receivedAt: new Date(),
          });
          callback();
        })
        // A message the fake cannot keep is refused, so the sender retries and records why.
        .catch((error: Error) => callback(Object.assign(new Error(`Not stored: ${error.message}`), { responseCode: 451 })));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      // Once listening, an error is one client's (a dropped connection): the fake carries on.
      server.on('error', () => {});
      resolve();
    });
  });
  const address = server.server.address();
  return {
    port: typeof address === 'object' && address ? address.port : port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

const envelopeSender = (session: SMTPServerSession) => (session.envelope.mailFrom ? session.envelope.mailFrom.address : '');

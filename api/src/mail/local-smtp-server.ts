import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface ReceivedMail {
  messageId: string | null;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  headers: Map<string, unknown>;
}

/** Largest message the local server takes (a care sheet with a photo fits well within it). */
const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

/**
 * An SMTP server on loopback that takes every message and hands it, parsed, to `onMail`. It stands in
 * for a real mail server in development and tests, so mail is really sent over SMTP by nodemailer and
 * really received, without leaving the machine.
 */
export async function startLocalSmtpServer(
  onMail: (mail: ReceivedMail) => Promise<void>,
): Promise<{ port: number; close(): Promise<void> }> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) =>
          onMail({
            messageId: parsed.messageId ?? null,
            from: addressText(parsed.from),
            to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            headers: parsed.headers,
          }),
        )
        .then(
          () => callback(),
          (err: Error) => callback(err),
        );
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;
  return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

function addressText(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

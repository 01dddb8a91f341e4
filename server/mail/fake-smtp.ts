/**
 * A real SMTP server on 127.0.0.1 that keeps received messages in memory. Used in development and tests
 * when SMTP_URL is unset, so outgoing mail goes through a genuine SMTP conversation (RFC 5321) and can be
 * inspected. Never used in production.
 */
import { SMTPServer } from 'smtp-server';

/** One received message; `text` is the decoded plain-text body. */
export interface ReceivedMail {
  from: string;
  to: string[];
  subject: string;
  text: string;
  raw: string;
  receivedAt: Date;
}

export interface FakeSmtp {
  host: string;
  port: number;
  messages: ReceivedMail[];
  /** Resolve with the first message (already received or arriving within timeoutMs) matching `pred`. */
  waitFor(pred: (m: ReceivedMail) => boolean, timeoutMs?: number): Promise<ReceivedMail>;
  close(): Promise<void>;
}

/** Decode quoted-printable (RFC 2045 §6.7). O(n). */
function decodeQuotedPrintable(s: string): string {
  const bytes = s
    .replace(/=\r?\n/g, '')
    .replace(/=([0-9A-F]{2})/gi, (_m, hex: string) => String.fromCharCode(parseInt(hex, 16)));
  return Buffer.from(bytes, 'latin1').toString('utf8');
}

/** Split a single-part message into headers and decoded text body. */
export function parseMessage(raw: string): { headers: Map<string, string>; text: string } {
  const sep = raw.search(/\r?\n\r?\n/);
  const head = sep >= 0 ? raw.slice(0, sep) : raw;
  const body = sep >= 0 ? raw.slice(sep).replace(/^\r?\n\r?\n/, '') : '';
  const headers = new Map<string, string>();
  // Unfold (RFC 5322 §2.2.3): a line break followed by white space continues the header.
  for (const line of head.replace(/\r?\n(?=[ \t])/g, '').split(/\r?\n/)) {
    const i = line.indexOf(':');
    if (i > 0) headers.set(line.slice(0, i).trim().toLowerCase(), line.slice(i + 1).trim());
  }
  const encoding = (headers.get('content-transfer-encoding') ?? '').toLowerCase();
  let text = body;
  if (encoding === 'quoted-printable') text = decodeQuotedPrintable(body);
  else if (encoding === 'base64') text = Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  return { headers, text };
}

/** Decode an RFC 2047 encoded-word header (=?UTF-8?Q?...?= / =?UTF-8?B?...?=). */
function decodeHeader(value: string): string {
  // White space between adjacent encoded words is not part of the text (RFC 2047 §6.2).
  return value.replace(/(\?=)\s+(?==\?)/g, '$1').replace(/=\?utf-8\?([qb])\?([^?]*)\?=/gi, (_m, kind: string, data: string) =>
    kind.toLowerCase() === 'b'
      ? Buffer.from(data, 'base64').toString('utf8')
      : decodeQuotedPrintable(data.replace(/_/g, ' ')),
  );
}

/** Start the fake SMTP server on 127.0.0.1:`port` (0 = any free port). */
export async function startFakeSmtp(port = 0, onMessage?: (m: ReceivedMail) => void): Promise<FakeSmtp> {
  const messages: ReceivedMail[] = [];
  const waiters: { pred: (m: ReceivedMail) => boolean; resolve: (m: ReceivedMail) => void }[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    banner: 'Quadrant local mail catcher',
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const raw = Buffer.concat(chunks).toString('utf8');
        const { headers, text } = parseMessage(raw);
        const mail: ReceivedMail = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: decodeHeader(headers.get('subject') ?? ''),
          text,
          raw,
          receivedAt: new Date(),
        };
        messages.push(mail);
        onMessage?.(mail);
        for (let i = waiters.length - 1; i >= 0; i--) {
          if (waiters[i].pred(mail)) {
            waiters[i].resolve(mail);
            waiters.splice(i, 1);
          }
        }
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  server.on('error', (err: Error) => console.error(`[fake-smtp] ${err.message}`));
  const address = server.server.address();
  const actualPort = typeof address === 'object' && address ? address.port : port;
  return {
    host: '127.0.0.1',
    port: actualPort,
    messages,
    waitFor(pred, timeoutMs = 10_000) {
      const found = messages.find(pred);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const waiter = { pred, resolve: (m: ReceivedMail) => (clearTimeout(timer), resolve(m)) };
        const timer = setTimeout(() => {
          waiters.splice(waiters.indexOf(waiter), 1);
          reject(new Error(`no matching mail within ${timeoutMs} ms`));
        }, timeoutMs);
        waiters.push(waiter);
      });
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/**
 * Outgoing mail through nodemailer over SMTP: to SMTP_URL when set, else to the built-in fake SMTP server
 * (development and test only), started on first use.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import type { Env } from '../env.js';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp.js';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  /** The fake SMTP server when in use (started lazily); null with SMTP_URL. */
  fakeSmtp(): Promise<FakeSmtp | null>;
  close(): Promise<void>;
}

/** Build the mailer for `env`. In production without SMTP_URL, sending fails with a clear error. */
export function createMailer(env: Env, log: (msg: string) => void = (m) => console.log(m)): Mailer {
  let fake: Promise<FakeSmtp> | null = null;
  let transport: Promise<Transporter> | null = null;
  const useFake = !env.SMTP_URL && env.NODE_ENV !== 'production';

  const getFake = () =>
    (fake ??= startFakeSmtp(env.FAKE_SMTP_PORT, (m) => {
      if (env.NODE_ENV === 'development') log(`[mail] to ${m.to.join(', ')}: ${m.subject}\n${m.text}`);
    }).then((f) => {
      if (env.NODE_ENV === 'development') log(`[mail] local fake SMTP server on ${f.host}:${f.port}`);
      return f;
    }));

  const getTransport = () =>
    (transport ??= (async () => {
      if (env.SMTP_URL) return nodemailer.createTransport(env.SMTP_URL);
      if (!useFake) throw new Error('SMTP_URL is not set; cannot send mail in production');
      const f = await getFake();
      return nodemailer.createTransport({ host: f.host, port: f.port, secure: false, ignoreTLS: true });
    })());

  return {
    async send(mail) {
      const t = await getTransport();
      await t.sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, text: mail.text, textEncoding: 'quoted-printable' });
    },
    async fakeSmtp() {
      return useFake ? getFake() : null;
    },
    async close() {
      if (transport) (await transport.catch(() => null))?.close();
      if (fake) await (await fake).close();
    },
  };
}

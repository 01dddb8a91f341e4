import { describe, expect, it } from 'vitest';
import { parseMessage } from '../../server/mail/fake-smtp.js';

describe('received mail parsing', () => {
  it('decodes a quoted-printable body with soft line breaks (RFC 2045 §6.7)', () => {
    const raw = [
      'Subject: Invitation',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'Open http://quadrant.test/invitations/accept?token=3DabcDEF_12-=',
      'xyz now. Caf=C3=A9',
    ].join('\r\n');
    const { headers, text } = parseMessage(raw);
    expect(headers.get('subject')).toBe('Invitation');
    expect(text).toBe('Open http://quadrant.test/invitations/accept?token=abcDEF_12-xyz now. Café');
  });

  it('unfolds a long header without adding spaces (RFC 5322 §2.2.3)', () => {
    const { headers } = parseMessage('Subject: Mira invited you to "Lens\r\n space seminar"\r\n\r\nbody');
    expect(headers.get('subject')).toBe('Mira invited you to "Lens space seminar"');
  });

  it('decodes a base64 body', () => {
    const body = Buffer.from('Hello, Ilse').toString('base64');
    const { text } = parseMessage(`Content-Transfer-Encoding: base64\r\n\r\n${body}\r\n`);
    expect(text).toBe('Hello, Ilse');
  });
});

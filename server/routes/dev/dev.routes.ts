/** GET /api/dev/mail: mail caught by the fake SMTP server (never mounted in production). */
import { Router } from 'express';
import type { DevMailResponse } from '../../contract/dev.js';
import type { AppDeps } from '../../deps.js';
import { HttpError } from '../../http/errors.js';

export function devRouter(deps: AppDeps): Router {
  const r = Router();
  r.get('/dev/mail', async (_req, res) => {
    const fake = await deps.mailer.fakeSmtp();
    if (!fake) throw new HttpError('not_found', 'No local mail catcher is running (SMTP_URL is set).');
    const body: DevMailResponse = {
      messages: fake.messages.map((m) => ({ to: m.to, subject: m.subject, text: m.text, receivedAt: m.receivedAt.toISOString() })),
    };
    res.set('Cache-Control', 'no-store').json(body);
  });
  return r;
}

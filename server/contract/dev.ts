/**
 * Development/test-only outbox of the built-in fake SMTP server (absent in production and with SMTP_URL):
 * lets browser tests and developers read mail the app sent. Client-safe.
 */
import { z } from 'zod';

export const DEV_MAIL_PATH = '/api/dev/mail';
export const devMailResponseSchema = z.object({
  messages: z.array(z.object({ to: z.array(z.string()), subject: z.string(), text: z.string(), receivedAt: z.string() })),
});
export type DevMailResponse = z.infer<typeof devMailResponseSchema>;

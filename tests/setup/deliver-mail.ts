import { processMailOnce } from '../../server/integrations/mail.js';
import type { TestSmtp } from './fakes.js';

/**
 * Runs the mail worker until the outbox is empty (five rounds at the most, retries a few
 * milliseconds apart), then everything the fake SMTP server has received, parsed.
 */
export async function deliverMail(smtp: TestSmtp) {
  for (let i = 0; i < 5; i++) {
    const round = await processMailOnce({ backoffBaseMs: 10, backoffMaxMs: 20 });
    if (round.claimed === 0) break;
  }
  return smtp.parsed();
}

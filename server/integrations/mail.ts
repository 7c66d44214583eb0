// Outbound e-mail: the only module that touches nodemailer. Messages go through the outbox
// table `outbound_mail`: queueMail() writes a row in the caller's transaction, and the mail
// worker sends due rows with retries, so a message is neither lost when the SMTP server is down
// nor sent twice when several workers run.
import { randomUUID } from 'node:crypto';
import nodemailer, { type Transporter } from 'nodemailer';
import pg from 'pg';
import { sql } from 'drizzle-orm';
import { config } from '../config.js';
import { db, type DbOrTx } from '../db/client.js';
import { outboundMail, type MailAttachmentRef } from '../db/schema/mail.js';
import { logger } from '../logger.js';
import { getObjectBuffer } from './s3.js';

export const MAIL_CHANNEL = 'outbound_mail';

export interface QueueMailInput {
  to: string[];
  subject: string;
  text: string;
  html?: string | null;
  attachments?: MailAttachmentRef[];
  /** The same key queues the message only once (e.g. `visit-report:<visitId>`). */
  dedupeKey?: string;
}

export interface MailWorkerOptions {
  /** How often to look for due messages besides being woken by NOTIFY (default MAIL_POLL_MS). */
  pollMs?: number;
  /** Messages claimed per round. */
  batchSize?: number;
  /** How long a claim lasts; a worker that dies mid-send leaves the row to the next after it. */
  leaseMs?: number;
  /** After this many failed attempts a message is marked `failed`. */
  maxAttempts?: number;
  /** First retry delay; doubles each attempt up to backoffMaxMs, with jitter. */
  backoffBaseMs?: number;
  backoffMaxMs?: number;
}

const defaults = {
  batchSize: 20,
  leaseMs: 5 * 60_000,
  maxAttempts: 8,
  backoffBaseMs: 30_000,
  backoffMaxMs: 60 * 60_000,
} as const;

// ---------------------------------------------------------------------------------------------
// Queueing

/**
 * Header values must not carry line breaks, or one field could add others (header injection,
 * OWASP ASVS 5.0 1.3.11). Other control characters go too; runs of white space become one.
 */
export function sanitiseHeaderValue(value: string): string {
  // Each such character becomes a space; the runs of white space they leave then become one.
  return Array.from(value, (char) => (breaksHeader(char) ? ' ' : char))
    .join('')
    .replace(/\s{2,}/g, ' ')
    .trim();
}

/** An ASCII control character (U+0000–U+001F, U+007F; CR and LF among them), or U+2028 / U+2029. */
function breaksHeader(char: string): boolean {
  const code = char.charCodeAt(0);
  return code < 0x20 || code === 0x7f || code === 0x2028 || code === 0x2029;
}

const singleAddress = /^[^\s@<>()[\]\\,;:"]+@[^\s@<>()[\]\\,;:"]+\.[^\s@<>()[\]\\,;:"]+$/;

/** A file name for a Content-Disposition header: one line, no path, no quotes. */
function sanitiseFileName(name: string): string {
  const base = sanitiseHeaderValue(name).replace(/["\\/]+/g, '_');
  return base || 'attachment';
}

function messageIdDomain(): string {
  const match = /@([A-Za-z0-9.-]+)>?\s*$/.exec(config().MAIL_FROM);
  return match ? match[1].toLowerCase() : 'gridkeep.invalid';
}

/**
 * Queues a message in the caller's transaction: it is sent only if that transaction commits.
 * Returns the row id, or null when a message with the same dedupe key was queued before.
 */
export async function queueMail(tx: DbOrTx, input: QueueMailInput): Promise<number | null> {
  const to = [...new Set(input.to.map(sanitiseHeaderValue).filter(Boolean))];
  if (to.length === 0) throw new Error('queueMail: no recipient');
  for (const address of to) {
    // One plain address per entry: a display name, a list or a line break in it is a caller bug.
    if (!singleAddress.test(address)) throw new Error(`queueMail: not a single e-mail address: ${JSON.stringify(address)}`);
  }
  const attachments = (input.attachments ?? []).map((a) => ({
    fileName: sanitiseFileName(a.fileName),
    contentType: sanitiseHeaderValue(a.contentType) || 'application/octet-stream',
    ...(a.content !== undefined ? { content: a.content } : {}),
    ...(a.storageKey !== undefined ? { storageKey: a.storageKey } : {}),
  }));
  for (const a of attachments) {
    if ((a.content === undefined) === (a.storageKey === undefined)) {
      throw new Error('queueMail: each attachment needs either content or a storageKey');
    }
  }
  const [row] = await tx
    .insert(outboundMail)
    .values({
      dedupeKey: input.dedupeKey ?? null,
      messageId: `<${randomUUID()}@${messageIdDomain()}>`,
      to,
      subject: sanitiseHeaderValue(input.subject),
      text: input.text,
      html: input.html ?? null,
      attachments,
    })
    .onConflictDoNothing()
    .returning({ id: outboundMail.id });
  if (!row) return null;
  // Delivered to listening workers when the transaction commits, never before.
  await tx.execute(sql`select pg_notify(${MAIL_CHANNEL}, '')`);
  return row.id;
}

// ---------------------------------------------------------------------------------------------
// Sending

let transport: Transporter | undefined;

function mailTransport(): Transporter {
  if (!transport) {
    const cfg = config();
    transport = nodemailer.createTransport({
      host: cfg.SMTP_HOST,
      port: cfg.SMTP_PORT,
      secure: cfg.SMTP_SECURE,
      ...(cfg.SMTP_USER ? { auth: { user: cfg.SMTP_USER, pass: cfg.SMTP_PASS ?? '' } } : {}),
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 60_000,
    });
  }
  return transport;
}

interface ClaimedRow {
  /** bigint: node-postgres returns it as a string. */
  id: string;
  message_id: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: MailAttachmentRef[];
  attempts: number;
}

/** Retry delay after the n-th failed attempt: doubling from the base, capped, with jitter. */
export function retryDelayMs(attempt: number, baseMs: number, maxMs: number, random = Math.random): number {
  const exponential = Math.min(maxMs, baseMs * 2 ** Math.max(0, attempt - 1));
  // "Equal jitter": half fixed, half random, so retries from many messages spread out.
  return Math.round(exponential / 2 + random() * (exponential / 2));
}

async function send(row: ClaimedRow) {
  const attachments = [];
  for (const a of row.attachments) {
    const content = a.storageKey ? await getObjectBuffer(a.storageKey) : (a.content ?? '');
    attachments.push({ filename: a.fileName, contentType: a.contentType, content });
  }
  await mailTransport().sendMail({
    from: config().MAIL_FROM,
    to: row.to,
    subject: row.subject,
    text: row.text,
    ...(row.html ? { html: row.html } : {}),
    attachments,
    // Fixed per row: a receiver can drop a duplicate if a crash came between send and mark.
    messageId: row.message_id,
  });
}

export interface MailRoundResult {
  claimed: number;
  sent: number;
  retried: number;
  failed: number;
}

/**
 * One round of the worker: claims due messages (queued and due, or claimed by a worker whose
 * lease ran out) with FOR UPDATE SKIP LOCKED, sends them, and records the outcome.
 */
export async function processMailOnce(options: MailWorkerOptions = {}): Promise<MailRoundResult> {
  const o = { ...defaults, ...options };
  const claimed = await db().execute<ClaimedRow & Record<string, unknown>>(sql`
    update outbound_mail m
       set status = 'sending',
           attempts = m.attempts + 1,
           locked_until = now() + make_interval(secs => ${o.leaseMs / 1000})
     where m.id in (
           select id from outbound_mail
            where (status = 'queued' and next_attempt_at <= now())
               or (status = 'sending' and locked_until < now())
            order by next_attempt_at, id
            limit ${o.batchSize}
            for update skip locked)
    returning m.id, m.message_id, m.to, m.subject, m.text, m.html, m.attachments, m.attempts`);

  const result: MailRoundResult = { claimed: claimed.rows.length, sent: 0, retried: 0, failed: 0 };
  for (const row of claimed.rows) {
    try {
      await send(row);
    } catch (err) {
      const message = sanitiseHeaderValue((err as Error).message ?? String(err)).slice(0, 1000);
      if (row.attempts >= o.maxAttempts) {
        result.failed += 1;
        logger.error('mail failed for good', { mailId: row.id, attempts: row.attempts, err: message });
        await db().execute(sql`
          update outbound_mail set status = 'failed', locked_until = null, last_error = ${message}
           where id = ${row.id} and status = 'sending'`);
      } else {
        result.retried += 1;
        const delay = retryDelayMs(row.attempts, o.backoffBaseMs, o.backoffMaxMs);
        logger.warn('mail not sent, will retry', { mailId: row.id, attempts: row.attempts, retryInMs: delay, err: message });
        await db().execute(sql`
          update outbound_mail
             set status = 'queued', locked_until = null, last_error = ${message},
                 next_attempt_at = now() + make_interval(secs => ${delay / 1000})
           where id = ${row.id} and status = 'sending'`);
      }
      continue;
    }
    result.sent += 1;
    await db().execute(sql`
      update outbound_mail set status = 'sent', sent_at = now(), locked_until = null, last_error = null
       where id = ${row.id}`);
  }
  return result;
}

// ---------------------------------------------------------------------------------------------
// The worker

export interface MailWorker {
  stop: () => Promise<void>;
  /** Runs a round now (also what NOTIFY does). */
  wake: () => void;
}

/**
 * Polls for due messages every `pollMs`, and at once when woken by `NOTIFY outbound_mail` on a
 * dedicated connection that reconnects after a database restart.
 */
export function startMailWorker(options: MailWorkerOptions = {}): MailWorker {
  const pollMs = options.pollMs ?? config().MAIL_POLL_MS;
  let stopped = false;
  let running: Promise<void> | null = null;
  let again = false;
  let pollTimer: NodeJS.Timeout | undefined;
  let reconnectTimer: NodeJS.Timeout | undefined;
  let listener: pg.Client | undefined;
  let reconnectDelay = 1000;

  const round = async () => {
    do {
      again = false;
      try {
        // Keep going while full batches come back: a backlog drains without waiting for polls.
        for (;;) {
          const r = await processMailOnce(options);
          if (stopped || r.claimed < (options.batchSize ?? defaults.batchSize)) break;
        }
      } catch (err) {
        logger.warn('mail worker round failed', { err: (err as Error).message });
      }
    } while (again && !stopped);
  };

  const wake = () => {
    if (stopped) return;
    if (running) {
      again = true;
      return;
    }
    running = round().finally(() => {
      running = null;
    });
  };

  const schedulePoll = () => {
    if (stopped) return;
    pollTimer = setTimeout(() => {
      wake();
      schedulePoll();
    }, pollMs);
    pollTimer.unref?.();
  };

  const listen = async () => {
    if (stopped) return;
    const client = new pg.Client({ connectionString: config().DATABASE_URL });
    listener = client;
    let lost = false;
    const onLost = (err?: Error) => {
      if (lost) return;
      lost = true;
      if (listener === client) listener = undefined;
      client.end().catch(() => {});
      if (stopped) return;
      logger.warn('mail worker lost its LISTEN connection; reconnecting', { err: err?.message, inMs: reconnectDelay });
      reconnectTimer = setTimeout(() => void listen(), reconnectDelay);
      reconnectDelay = Math.min(reconnectDelay * 2, 5000);
    };
    client.on('error', onLost);
    client.on('end', () => onLost());
    client.on('notification', () => wake());
    try {
      await client.connect();
      await client.query(`listen ${MAIL_CHANNEL}`);
      if (stopped) {
        await client.end();
        return;
      }
      reconnectDelay = 1000;
      // Anything queued while the connection was down is due now.
      wake();
    } catch (err) {
      onLost(err as Error);
    }
  };

  void listen();
  wake();
  schedulePoll();

  return {
    wake,
    async stop() {
      stopped = true;
      clearTimeout(pollTimer);
      clearTimeout(reconnectTimer);
      const l = listener;
      listener = undefined;
      await l?.end().catch(() => {});
      await running;
    },
  };
}

/** Closes the SMTP transport (graceful shutdown). */
export function closeMail() {
  transport?.close();
  transport = undefined;
}

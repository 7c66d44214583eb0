import fs from 'node:fs/promises';
import path from 'node:path';
import { Router } from 'express';
import { simpleParser, type ParsedMail } from 'mailparser';
import type { MailboxItem } from '../../shared/schemas/auth.js';
import { config } from '../config.js';
import { notFound } from '../errors.js';
import { requireRole } from '../middleware/auth.js';

/**
 * The development mailbox: what the local SMTP fake received (scripts/lib/smtp-fake.ts writes one
 * .eml file per message into DEV_MAILBOX_DIR). Admins only; absent (404) when real SMTP is used.
 */
export const devRouter = Router();

const MAX_ITEMS = 200;
const idPattern = /^[A-Za-z0-9][A-Za-z0-9._-]{0,100}$/;

function mailboxDir(): string {
  const dir = config().DEV_MAILBOX_DIR;
  if (!dir) throw notFound('Mailbox');
  return dir;
}

// Received files never change (the fake renames a finished file into place), so a parsed
// message can be kept by file name.
const parsed = new Map<string, Promise<ParsedMail>>();

function parse(file: string): Promise<ParsedMail> {
  let p = parsed.get(file);
  if (!p) {
    p = fs.readFile(file).then((raw) => simpleParser(raw));
    p.catch(() => parsed.delete(file));
    parsed.set(file, p);
    if (parsed.size > MAX_ITEMS * 2) parsed.delete(parsed.keys().next().value!);
  }
  return p;
}

async function messageFile(id: string): Promise<string> {
  if (!idPattern.test(id)) throw notFound('Message');
  const file = path.join(mailboxDir(), `${id}.eml`);
  try {
    await fs.access(file);
  } catch {
    throw notFound('Message');
  }
  return file;
}

function toItem(id: string, mail: ParsedMail, fallbackDate: Date): MailboxItem {
  const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : (mail.to?.text ?? '');
  return {
    id,
    to,
    subject: mail.subject ?? '',
    text: mail.text ?? '',
    html: typeof mail.html === 'string' ? mail.html : null,
    date: (mail.date ?? fallbackDate).toISOString(),
    attachments: mail.attachments.map((a, i) => ({
      filename: a.filename ?? `attachment-${i + 1}`,
      contentType: a.contentType,
    })),
  };
}

// Not there at all unless the local SMTP fake is in use; then for admins only.
devRouter.use((_req, _res, next) => next(config().DEV_MAILBOX_DIR ? undefined : notFound('Endpoint')));
devRouter.use(requireRole('admin'));

/** Newest first. */
devRouter.get('/mailbox', async (_req, res) => {
  const dir = mailboxDir();
  let names: string[] = [];
  try {
    names = (await fs.readdir(dir)).filter((n) => n.endsWith('.eml') && idPattern.test(n.slice(0, -4)));
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err;
  }
  const files = await Promise.all(
    names.map(async (name) => {
      const full = path.join(dir, name);
      const stat = await fs.stat(full).catch(() => null);
      return stat ? { id: name.slice(0, -4), full, mtime: stat.mtime } : null;
    }),
  );
  const newest = files
    .filter((f) => f !== null)
    .sort((a, b) => b.mtime.getTime() - a.mtime.getTime() || b.id.localeCompare(a.id))
    .slice(0, MAX_ITEMS);
  const items: MailboxItem[] = [];
  for (const f of newest) {
    try {
      items.push(toItem(f.id, await parse(f.full), f.mtime));
    } catch {
      /* a file that is not a message: leave it out */
    }
  }
  items.sort((a, b) => b.date.localeCompare(a.date) || b.id.localeCompare(a.id));
  res.json({ items });
});

/** Downloads one attachment of a received message, always as a download (never rendered inline). */
devRouter.get('/mailbox/:id/attachments/:index', async (req, res) => {
  const file = await messageFile(String(req.params.id));
  const index = Number(req.params.index);
  const mail = await parse(file);
  const attachment = Number.isInteger(index) && index >= 0 ? mail.attachments[index] : undefined;
  if (!attachment) throw notFound('Attachment');
  res.attachment(attachment.filename ?? `attachment-${index + 1}`);
  res.type(attachment.contentType || 'application/octet-stream');
  res.setHeader('Content-Length', String(attachment.content.length));
  res.send(attachment.content);
});

// The local SMTP fake: smtp-server on loopback that accepts every message and writes it as an
// .eml file. `npm start` points the app's DEV_MAILBOX_DIR at that folder (the development
// mailbox page reads it); integration tests start one on a free port and read messages().
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';

export interface SmtpFakeOptions {
  /** Where received messages are written; a new temporary folder when omitted. */
  dir?: string;
  /** 0 or omitted: any free port. */
  port?: number;
}

export interface ReceivedMail {
  /** The .eml file's name without its extension. */
  id: string;
  file: string;
  raw: Buffer;
  envelope: { from: string | null; to: string[] };
}

export interface SmtpFake {
  port: number;
  host: string;
  dir: string;
  /** Messages this instance received, oldest first. */
  messages: () => ReceivedMail[];
  stop: () => Promise<void>;
}

let sequence = 0;

/** A file name that sorts by arrival time and never collides. */
function nextMessageId() {
  sequence = (sequence + 1) % 1_000_000;
  return `${Date.now()}-${String(sequence).padStart(6, '0')}-${randomBytes(4).toString('hex')}`;
}

export async function startSmtpFake(options: SmtpFakeOptions = {}): Promise<SmtpFake> {
  const dir = options.dir ?? fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-mail-'));
  fs.mkdirSync(dir, { recursive: true });
  const received: ReceivedMail[] = [];

  const server = new SMTPServer({
    // Plain SMTP on loopback: no TLS upgrade, any (or no) credentials.
    secure: false,
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    onAuth: (_auth, _session, callback) => callback(null, { user: 'dev' }),
    logger: false,
    banner: 'Gridkeep development mailbox',
    size: 50 * 1024 * 1024,
    closeTimeout: 1000,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          const err = Object.assign(new Error('Message exceeds the size limit'), { responseCode: 552 });
          return callback(err);
        }
        const raw = Buffer.concat(chunks);
        const id = nextMessageId();
        const file = path.join(dir, `${id}.eml`);
        try {
          // Write to a temporary name first so a reader never sees half a message.
          fs.writeFileSync(`${file}.part`, raw);
          fs.renameSync(`${file}.part`, file);
        } catch (err) {
          return callback(err as Error);
        }
        const { mailFrom, rcptTo } = session.envelope;
        received.push({
          id,
          file,
          raw,
          envelope: { from: mailFrom ? mailFrom.address : null, to: rcptTo.map((r) => r.address) },
        });
        callback();
      });
    },
  });
  server.on('error', () => {
    /* a client that drops its connection mid-session: nothing to do */
  });

  await new Promise<void>((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.server.once('error', onError);
    server.listen(options.port ?? 0, '127.0.0.1', () => {
      server.server.off('error', onError);
      resolve();
    });
  });
  const port = (server.server.address() as AddressInfo).port;

  let stopped = false;
  const stop = () =>
    new Promise<void>((resolve) => {
      if (stopped) return resolve();
      stopped = true;
      server.close(() => resolve());
    });

  return { port, host: '127.0.0.1', dir, messages: () => [...received], stop };
}

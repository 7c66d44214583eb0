// The local S3 and SMTP fakes for integration tests: started in-process on free ports with their
// data in temporary folders, restartable on the same port (to test outages), removed afterwards.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';
import { s3FakeCredentials, startS3Fake, type S3Fake } from '../../scripts/lib/s3-fake.js';
import { startSmtpFake, type ReceivedMail, type SmtpFake } from '../../scripts/lib/smtp-fake.js';

export interface TestS3 {
  current: S3Fake;
  /** The settings that point the server at this fake (server/config.ts names). */
  env: Record<string, string>;
  restart: () => Promise<void>;
  stop: () => Promise<void>;
  /** Stops the fake and removes its folder. */
  dispose: () => Promise<void>;
}

export async function startTestS3(bucket = 'gridkeep-test'): Promise<TestS3> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-s3-test-'));
  const handle: TestS3 = {
    current: await startS3Fake({ dir }),
    env: {},
    async restart() {
      await handle.current.stop();
      handle.current = await startS3Fake({ dir, port: handle.current.port });
    },
    stop: () => handle.current.stop(),
    async dispose() {
      await handle.current.stop();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
  handle.env = {
    S3_ENDPOINT: handle.current.endpoint,
    S3_BUCKET: bucket,
    S3_REGION: 'us-east-1',
    S3_FORCE_PATH_STYLE: 'true',
    S3_ACCESS_KEY_ID: s3FakeCredentials.accessKeyId,
    S3_SECRET_ACCESS_KEY: s3FakeCredentials.secretAccessKey,
  };
  return handle;
}

export interface ParsedReceivedMail {
  received: ReceivedMail;
  mail: ParsedMail;
}

export interface TestSmtp {
  current: SmtpFake;
  dir: string;
  env: Record<string, string>;
  /** Every message received since the start, across restarts, oldest first. */
  received: () => ReceivedMail[];
  /** The same, parsed with mailparser. */
  parsed: () => Promise<ParsedReceivedMail[]>;
  /** Stops the fake; the port stays reserved for start(). */
  stop: () => Promise<void>;
  /** Starts it again on the same port and folder. */
  start: () => Promise<void>;
  dispose: () => Promise<void>;
}

export async function startTestSmtp(): Promise<TestSmtp> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-mail-test-'));
  const earlier: ReceivedMail[] = [];
  let running = true;
  const first = await startSmtpFake({ dir });
  const port = first.port;
  const handle: TestSmtp = {
    current: first,
    dir,
    env: { SMTP_HOST: first.host, SMTP_PORT: String(port), DEV_MAILBOX_DIR: dir },
    received: () => [...earlier, ...(running ? handle.current.messages() : [])],
    parsed: () => Promise.all(handle.received().map(async (r) => ({ received: r, mail: await simpleParser(r.raw) }))),
    async stop() {
      if (!running) return;
      running = false;
      earlier.push(...handle.current.messages());
      await handle.current.stop();
    },
    async start() {
      if (running) return;
      handle.current = await startSmtpFake({ dir, port });
      running = true;
    },
    async dispose() {
      await handle.stop();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
  return handle;
}

/** Sets environment variables and returns a function that puts the old values back. */
export function setEnv(values: Record<string, string | undefined>): () => void {
  const before = Object.fromEntries(Object.keys(values).map((k) => [k, process.env[k]]));
  for (const [k, v] of Object.entries(values)) {
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
  return () => {
    for (const [k, v] of Object.entries(before)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  };
}

// One-line JSON logs on stdout/stderr; quiet under tests unless LOG_LEVEL says otherwise.
//
// Every log call passes through one redaction step (`redact`), keys and values alike: secrets
// and personal data never reach a log line (OWASP ASVS 5.0 16.2.5: credentials are not logged,
// tokens only masked). A failed query is logged by the statement's first
// words and PostgreSQL's error code, never with its bound parameters.
type Level = 'debug' | 'info' | 'warn' | 'error';
const order: Record<Level, number> = { debug: 10, info: 20, warn: 30, error: 40 };
const threshold = order[(process.env.LOG_LEVEL as Level) ?? (process.env.VITEST ? 'error' : 'info')] ?? 20;

export const REDACTED = '[redacted]';

/** Field names whose value is never logged, at any depth (password, passwordHash, token, email, phone…). */
const sensitiveKey =
  /e-?mail|phone|mobile|password|passw|pwd|secret|token|hash|cookie|authori[sz]ation|signature|credential|api-?key|params|parameters/i;

/** Values redacted wherever they appear inside a string. */
const sensitiveValues: [RegExp, string][] = [
  // What Drizzle puts after a failed statement: its bound values.
  [/\bparams:[\s\S]*$/i, `params: ${REDACTED}`],
  // Password hashes in PHC form: $argon2id$v=19$m=…$salt$hash, $2b$… (bcrypt), $scrypt$…
  [/\$(?:argon2(?:id|i|d)|2[abxy]?|scrypt|pbkdf2[\w-]*)\$[^\s"'`]+/gi, REDACTED],
  // JSON Web Tokens (three base64url parts, the first starting with {" = eyJ).
  [/\beyJ[\w-]+\.[\w-]+\.[\w-]*/g, REDACTED],
  // Bearer / Basic credentials.
  [/\b(Bearer|Basic)\s+[\w.~+/=-]+/gi, `$1 ${REDACTED}`],
  // E-mail addresses.
  [/[\w.!#$%&'*+/=?^`{|}~-]+@[\w-]+(?:\.[\w-]+)+/g, REDACTED],
  // International phone numbers (+1 312 555 0100, +44 (0)20 7946 0958).
  [/\+\d[\d\s().-]{6,}\d/g, REDACTED],
];

export function redactText(text: string): string {
  let out = text;
  for (const [pattern, replacement] of sensitiveValues) out = out.replace(pattern, replacement);
  return out;
}

interface PgLikeError {
  code?: unknown;
  constraint?: unknown;
  table?: unknown;
  column?: unknown;
  routine?: unknown;
  severity?: unknown;
}

/** `insert into "users"`, `update "sessions"`, `select from "tickets"`: what a statement did, without its values. */
export function statementName(query: string): string {
  const verb = /^\s*(?:with\b[\s\S]*?\)\s*)?(\w+)/i.exec(query)?.[1]?.toLowerCase() ?? 'statement';
  const table = /\b(?:into|update|from)\s+("[^"]+"|[\w.]+)/i.exec(query)?.[1];
  if (!table) return verb;
  if (verb === 'insert') return `insert into ${table}`;
  if (verb === 'update') return `update ${table}`;
  return `${verb} from ${table}`;
}

/** The stack's frames only: its first line repeats the message, which may carry values. */
function framesOf(stack: string | undefined): string | undefined {
  if (!stack) return undefined;
  const at = stack.indexOf('\n    at ');
  return at === -1 ? undefined : stack.slice(at + 1);
}

function serialiseError(err: Error, depth: number, seen: WeakSet<object>): Record<string, unknown> {
  const out: Record<string, unknown> = { name: err.name };
  const e = err as Error & PgLikeError & { query?: unknown; params?: unknown; cause?: unknown };
  const isQueryError = typeof e.query === 'string' && 'params' in e;
  const pg = typeof e.code === 'string' && typeof e.severity === 'string';
  if (isQueryError) {
    // Drizzle's DrizzleQueryError: "Failed query: <sql>\nparams: <every bound value>".
    out.message = 'Failed query';
    out.statement = statementName(e.query as string);
  } else if (pg) {
    // A PostgreSQL error: its code says what went wrong. Its message may quote a bound value
    // ('invalid input syntax for type uuid: "…"'), except for a statement's own mistakes (42xxx).
    out.code = e.code;
    if ((e.code as string).startsWith('42')) out.message = redactText(err.message);
    for (const k of ['constraint', 'table', 'column', 'routine'] as const) if (typeof e[k] === 'string') out[k] = e[k];
  } else {
    out.message = redactText(err.message);
    if (typeof e.code === 'string' || typeof e.code === 'number') out.code = e.code;
  }
  const frames = framesOf(err.stack);
  if (frames) out.stack = frames;
  if (e.cause !== undefined && depth < 4) out.cause = redact(e.cause, depth + 1, seen);
  return out;
}

/**
 * The one redaction step of every log call: sensitive keys lose their value, strings lose what
 * looks like an address, a hash or a token, errors lose their query parameters.
 */
export function redact(value: unknown, depth = 0, seen = new WeakSet<object>()): unknown {
  if (typeof value === 'string') return redactText(value);
  if (value === null || typeof value !== 'object') return value;
  if (value instanceof Date) return value.toISOString();
  if (Buffer.isBuffer(value)) return `[${value.length} bytes]`;
  if (seen.has(value)) return '[circular]';
  if (depth > 6) return '[nested]';
  seen.add(value);
  try {
    if (value instanceof Error) return serialiseError(value, depth, seen);
    if (Array.isArray(value)) return value.map((v) => redact(v, depth + 1, seen));
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) {
      out[k] = sensitiveKey.test(k) && v !== null && v !== undefined && v !== '' ? REDACTED : redact(v, depth + 1, seen);
    }
    return out;
  } finally {
    seen.delete(value); // only an ancestor makes a cycle; the same object twice side by side is fine
  }
}

/** Where log lines go; tests swap it to read them. */
export const logSink = {
  write(level: Level, line: string) {
    (level === 'error' || level === 'warn' ? process.stderr : process.stdout).write(line + '\n');
  },
};

function write(level: Level, msg: string, fields: Record<string, unknown> = {}) {
  if (order[level] < threshold) return;
  const safe = redact(fields) as Record<string, unknown>;
  logSink.write(level, JSON.stringify({ time: new Date().toISOString(), level, msg: redactText(msg), ...safe }));
}

export const logger = {
  debug: (msg: string, fields?: Record<string, unknown>) => write('debug', msg, fields),
  info: (msg: string, fields?: Record<string, unknown>) => write('info', msg, fields),
  warn: (msg: string, fields?: Record<string, unknown>) => write('warn', msg, fields),
  error: (msg: string, fields?: Record<string, unknown>) => write('error', msg, fields),
};

// The one layout of every e-mail Gridkeep sends. A message is described once (a heading, a few
// paragraphs, someone's quoted words, the facts that matter, one button) and rendered twice: as
// HTML for mail apps and as the plain-text alternative beside it, so the two never disagree.
// The HTML is one column at most 600 px wide with inline styles only (many mail apps drop a
// <style> block) and tables for the frame (some desktop mail apps ignore max-width on a div).
import { config } from '../config.js';

export interface MailFact {
  label: string;
  value: string;
}

export interface MailMessage {
  /** The line a mail app shows beside the subject; hidden in the body. */
  preview: string;
  heading: string;
  /** Plain text; line breaks inside a paragraph are kept. */
  paragraphs?: string[];
  /** Someone's own words (a reply, a fault description), set apart and credited. */
  quote?: { author: string; body: string };
  facts?: MailFact[];
  /** The one thing to do next: a button in HTML, a labelled link in text. */
  action?: { label: string; url: string };
  /** Small print at the end (why this message came, what to do if unexpected). */
  footnote?: string;
}

export interface RenderedMail {
  text: string;
  html: string;
}

/** Escapes text for HTML content and attribute values (OWASP XSS prevention, rule 1 and 2). */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** Escaped, with the writer's line breaks kept. */
const multiline = (value: string) => escapeHtml(value).replace(/\r?\n/g, '<br>');

// The product's palette (tailwind.config.ts): ink for text and the header, amber for the action.
const colour = {
  ink950: '#0b2227',
  ink900: '#12343b',
  ink50: '#f1f6f6',
  stone50: '#f6f7f6',
  stone200: '#dde1e0',
  stone600: '#525e5d',
  amber400: '#f4a62a',
  amber500: '#e18a0f',
  white: '#ffffff',
} as const;

// The phone's own font: no web font to fetch, nothing a mail app would block.
const fontStack = "-apple-system, BlinkMacSystemFont, 'Segoe UI', Roboto, Helvetica, Arial, sans-serif";

export function renderMail(message: MailMessage): RenderedMail {
  return { text: renderText(message), html: renderHtml(message) };
}

function renderText(m: MailMessage): string {
  const blocks: string[] = [m.heading, ...(m.paragraphs ?? [])];
  if (m.quote) blocks.push(`${m.quote.author} wrote:\n${m.quote.body.replace(/^/gm, '> ')}`);
  if (m.facts?.length) blocks.push(m.facts.map((f) => `${f.label}: ${f.value}`).join('\n'));
  if (m.action) blocks.push(`${m.action.label}: ${m.action.url}`);
  if (m.footnote) blocks.push(m.footnote);
  return `${blocks.join('\n\n')}\n\n-- \nGridkeep · ${config().APP_URL}\n`;
}

function renderHtml(m: MailMessage): string {
  const p = `margin:0 0 16px;font-size:16px;line-height:24px;color:${colour.ink950}`;
  const parts: string[] = [
    `<h1 style="margin:0 0 16px;font-size:22px;line-height:28px;font-weight:700;color:${colour.ink950}">${escapeHtml(m.heading)}</h1>`,
    ...(m.paragraphs ?? []).map((text) => `<p style="${p}">${multiline(text)}</p>`),
  ];
  if (m.quote) {
    parts.push(
      `<div style="margin:0 0 16px;padding:12px 16px;border-left:4px solid ${colour.amber400};background:${colour.stone50}">` +
        `<p style="margin:0 0 4px;font-size:14px;line-height:20px;font-weight:600;color:${colour.stone600}">${escapeHtml(m.quote.author)} wrote:</p>` +
        `<p style="margin:0;font-size:16px;line-height:24px;color:${colour.ink950}">${multiline(m.quote.body)}</p></div>`,
    );
  }
  if (m.facts?.length) parts.push(factsHtml(m.facts));
  if (m.action) parts.push(buttonHtml(m.action));
  if (m.footnote)
    parts.push(`<p style="margin:16px 0 0;font-size:14px;line-height:20px;color:${colour.stone600}">${multiline(m.footnote)}</p>`);

  const appUrl = config().APP_URL;
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<meta name="color-scheme" content="light">',
    `<title>${escapeHtml(m.heading)}</title>`,
    '</head>',
    `<body style="margin:0;padding:0;background:${colour.ink50};font-family:${fontStack};-webkit-text-size-adjust:100%">`,
    `<div style="display:none;max-height:0;overflow:hidden;mso-hide:all">${escapeHtml(m.preview)}</div>`,
    `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="background:${colour.ink50}">`,
    '<tr><td align="center" style="padding:16px 8px">',
    `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="width:100%;max-width:600px;background:${colour.white};border:1px solid ${colour.stone200};border-radius:8px">`,
    `<tr><td style="padding:14px 20px;background:${colour.ink900};border-radius:8px 8px 0 0;font-family:${fontStack};font-size:16px;line-height:20px;font-weight:700;color:${colour.white}">Gridkeep</td></tr>`,
    `<tr><td style="padding:24px 20px;font-family:${fontStack}">${parts.join('')}</td></tr>`,
    `<tr><td style="padding:12px 20px 20px;border-top:1px solid ${colour.stone200};font-family:${fontStack};font-size:13px;line-height:18px;color:${colour.stone600}">` +
      `Sent by Gridkeep · <a href="${escapeHtml(appUrl)}" style="color:${colour.stone600}">${escapeHtml(appUrl)}</a></td></tr>`,
    '</table>',
    '</td></tr>',
    '</table>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

/** Label above value, one fact per row: reads on a 320 px screen without a second column. */
function factsHtml(facts: MailFact[]): string {
  const rows = facts
    .map(
      (f) =>
        `<tr><td style="padding:8px 0;border-bottom:1px solid ${colour.stone200}">` +
        `<div style="font-size:13px;line-height:18px;color:${colour.stone600}">${escapeHtml(f.label)}</div>` +
        `<div style="font-size:16px;line-height:24px;color:${colour.ink950}">${multiline(f.value)}</div></td></tr>`,
    )
    .join('');
  return `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="margin:0 0 24px;border-top:1px solid ${colour.stone200}">${rows}</table>`;
}

/**
 * A link drawn as a button: 14 px padding around a 20 px line makes it 48 px tall, above the
 * 44 × 44 px target of WCAG 2.2 SC 2.5.5; the cell carries the colour for apps that drop padding.
 */
function buttonHtml(action: { label: string; url: string }): string {
  const href = escapeHtml(action.url);
  return (
    '<table role="presentation" cellpadding="0" cellspacing="0" border="0" style="margin:0 0 8px"><tr>' +
    `<td style="border-radius:6px;background:${colour.amber400};border:1px solid ${colour.amber500}">` +
    `<a href="${href}" style="display:inline-block;padding:14px 24px;font-family:${fontStack};font-size:16px;line-height:20px;` +
    `font-weight:700;color:${colour.ink950};text-decoration:none;border-radius:6px">${escapeHtml(action.label)}</a>` +
    '</td></tr></table>' +
    `<p style="margin:0 0 16px;font-size:13px;line-height:18px;color:${colour.stone600};word-break:break-all">${href}</p>`
  );
}

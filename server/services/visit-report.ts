// The visit report: one PDF for the client, made when the visit is closed (or on the first
// download of an older completed visit) and kept in object storage. It shows what the client
// may see: the work, the parts and their batches, the photos and the sign-off; never costs or
// internal notes.
import { inflateSync } from 'node:zlib';
import PDFDocument from 'pdfkit';
import { actionLabels, componentLabels, faultLabels, fateLabels, type RepairItem } from '../../shared/schemas/repairs.js';
import type { ChecklistItem } from '../../shared/schemas/visits.js';
import { config } from '../config.js';
import { getObjectBuffer } from '../integrations/s3.js';
import { logger } from '../logger.js';
import { formatWindow } from './visit-mail.js';

export interface ReportData {
  visit: {
    id: string;
    kind: 'ticket' | 'maintenance';
    windowStart: Date;
    windowEnd: Date;
    startedAt: Date | null;
    completedAt: Date | null;
    checklist: ChecklistItem[];
    summary: string;
    signedByName: string | null;
    signedAt: Date | null;
    unsignedReason: string | null;
  };
  clientName: string;
  siteName: string;
  address: string;
  timeZone: string;
  wallName: string | null;
  ticket: { ref: string; title: string } | null;
  technicians: string[];
  /** As a client user sees them: no costs, no internal notes. */
  repairs: RepairItem[];
  photos: { fileName: string; contentType: string; repairId: string | null; storageKey: string }[];
  /** The signature pad's PNG. */
  signature: Buffer | null;
}

/**
 * "Visit report 2026-12-10 Atrium 1042-26.pdf": the day (at the site), the site, the ticket's
 * reference with a dash for its slash, which no file name may hold (search reads it back).
 */
export function reportFileName(d: {
  siteName: string;
  ticket: { ref: string } | null;
  visit: { completedAt: Date | null; windowStart: Date };
  timeZone: string;
}) {
  const day = localDay(d.visit.completedAt ?? d.visit.windowStart, d.timeZone);
  const site = d.siteName.replace(/[^\p{L}\p{N} .,&()-]+/gu, ' ').trim();
  return ['Visit report', day, site, d.ticket?.ref.replace('/', '-')].filter(Boolean).join(' ') + '.pdf';
}

const localDay = (at: Date, timeZone: string) =>
  new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);

const localTime = (at: Date | null, timeZone: string) =>
  at
    ? new Intl.DateTimeFormat('en-US', {
        timeZone,
        month: 'short',
        day: 'numeric',
        year: 'numeric',
        hour: 'numeric',
        minute: '2-digit',
        timeZoneName: 'short',
      }).format(at)
    : 'not recorded';

/** The company's name for the heading: the display name of the sender address ("Gridkeep <…>"). */
function companyName() {
  const match = /^\s*"?([^"<]+?)"?\s*</.exec(config().MAIL_FROM);
  return match ? match[1] : 'Service report';
}

// The PDF's standard fonts (Helvetica) carry the WinAnsi characters only (ISO 32000-1 Annex D.2).
const winAnsiExtras = '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ';
const standIns: Record<string, string> = {
  '→': '->',
  '←': '<-',
  '≥': '>=',
  '≤': '<=',
  '≠': '!=',
  Ł: 'L',
  ł: 'l',
  Đ: 'D',
  đ: 'd',
  '✓': 'done',
  '−': '-',
};
const inWinAnsi = (ch: string) => {
  const code = ch.codePointAt(0)!;
  return code === 0x0a || (code >= 0x20 && code <= 0x7e) || (code >= 0xa0 && code <= 0xff) || winAnsiExtras.includes(ch);
};

/** Text the standard fonts can draw: accents outside WinAnsi dropped, a few symbols spelled out, anything else "?". */
export function winAnsi(text: string): string {
  return Array.from(text, (ch) => {
    if (inWinAnsi(ch)) return ch;
    if (standIns[ch]) return standIns[ch];
    const base = ch.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
    return base && Array.from(base).every(inWinAnsi) ? base : '?';
  }).join('');
}

const embeddable = new Set(['image/jpeg', 'image/png']);

const pngSignature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/**
 * True when the bytes are a PNG whose image data inflates (RFC 2083 §3.1 signature, §3.2
 * chunks, §5 zlib image data). The PDF writer inflates PNG data outside any try, so a damaged
 * PNG is refused here rather than there.
 */
export function isDecodablePng(bytes: Buffer): boolean {
  if (bytes.length < 8 || !bytes.subarray(0, 8).equals(pngSignature)) return false;
  const data: Buffer[] = [];
  let at = 8;
  while (at + 8 <= bytes.length) {
    const length = bytes.readUInt32BE(at);
    const type = bytes.toString('latin1', at + 4, at + 8);
    if (at + 12 + length > bytes.length) return false;
    if (type === 'IDAT') data.push(bytes.subarray(at + 8, at + 8 + length));
    if (type === 'IEND') break;
    at += 12 + length;
  }
  if (!data.length) return false;
  try {
    inflateSync(Buffer.concat(data));
    return true;
  } catch {
    return false;
  }
}

/** JPEGs start with the SOI marker FF D8 FF (ITU-T T.81 Annex B). */
const looksLikeJpeg = (bytes: Buffer) => bytes.length > 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff;
const drawable = (bytes: Buffer) => isDecodablePng(bytes) || looksLikeJpeg(bytes);
const MARGIN = 50;
const INK = '#1f2937';
const MUTED = '#6b7280';

/** Renders the report; photos are read from object storage (one that cannot be read is listed by name). */
export async function renderVisitReport(d: ReportData): Promise<Buffer> {
  const images = new Map<string, Buffer>();
  for (const p of d.photos) {
    if (!embeddable.has(p.contentType)) continue;
    try {
      const bytes = await getObjectBuffer(p.storageKey);
      if (drawable(bytes)) images.set(p.storageKey, bytes);
    } catch (err) {
      logger.warn('a repair photo could not be read for the visit report', { key: p.storageKey, err: (err as Error).message });
    }
  }

  const title = `Visit report — ${d.siteName}${d.ticket ? ` (${d.ticket.ref})` : ''}`;
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    info: { Title: title, Author: companyName(), Subject: `Visit ${d.visit.id}` },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve, reject) => {
    doc.on('end', resolve);
    doc.on('error', reject);
  });
  const width = doc.page.width - 2 * MARGIN;

  const heading = (text: string) => {
    ensureRoom(doc, 60);
    doc.moveDown(0.8).font('Helvetica-Bold').fontSize(12).fillColor(INK).text(winAnsi(text));
    doc.moveDown(0.3).font('Helvetica').fontSize(10);
  };
  const field = (label: string, value: string) => {
    doc.font('Helvetica-Bold').fontSize(10).fillColor(MUTED).text(`${label}: `, { continued: true });
    doc.font('Helvetica').fillColor(INK).text(winAnsi(value));
  };

  // Heading
  doc.font('Helvetica-Bold').fontSize(18).fillColor(INK).text(winAnsi(companyName()));
  doc
    .font('Helvetica')
    .fontSize(14)
    .text(d.visit.kind === 'maintenance' ? 'Planned maintenance report' : 'Service visit report');
  doc.moveDown(0.5);

  // Where, for whom, when, who
  field('Client', d.clientName);
  field('Site', d.siteName);
  if (d.address) field('Address', d.address);
  const walls = [...new Set([d.wallName, ...d.repairs.map((r) => r.wallName)].filter((w): w is string => Boolean(w)))];
  if (walls.length) field(walls.length === 1 ? 'Wall' : 'Walls', walls.join(', '));
  if (d.ticket) field('Ticket', `${d.ticket.ref} — ${d.ticket.title}`);
  field('Planned', formatWindow(d.visit.windowStart, d.visit.windowEnd, d.timeZone));
  field('Started', localTime(d.visit.startedAt, d.timeZone));
  field('Finished', localTime(d.visit.completedAt, d.timeZone));
  field('Technicians', d.technicians.join(', ') || '—');

  // Checklist, with drawn ticks (the standard fonts have no check mark)
  if (d.visit.checklist.length) {
    heading('Checklist');
    for (const item of d.visit.checklist) {
      ensureRoom(doc, 20);
      const y = doc.y;
      doc
        .lineWidth(0.8)
        .strokeColor(INK)
        .rect(MARGIN, y + 1, 9, 9)
        .stroke();
      if (item.done) {
        doc
          .lineWidth(1.4)
          .moveTo(MARGIN + 1.5, y + 5.5)
          .lineTo(MARGIN + 4, y + 8.5)
          .lineTo(MARGIN + 8.5, y + 2)
          .stroke();
      }
      const note = item.note ? ` — ${item.note}` : '';
      doc
        .font('Helvetica')
        .fontSize(10)
        .fillColor(INK)
        .text(winAnsi(`${item.label}${note}${item.done ? '' : ' (not done)'}`), MARGIN + 16, y, { width: width - 16 });
      doc.x = MARGIN;
      doc.moveDown(0.2);
    }
  }

  // The work
  heading('Work done');
  if (!d.repairs.length) doc.text('No repairs were logged on this visit.');
  for (const r of d.repairs) {
    ensureRoom(doc, 70);
    const module = r.moduleColumn !== null && r.moduleRow !== null ? ` at module column ${r.moduleColumn}, row ${r.moduleRow}` : '';
    doc
      .font('Helvetica-Bold')
      .text(winAnsi(`${r.position}  ${componentLabels[r.component]}${module}`))
      .font('Helvetica');
    const lines = [
      `${d.wallName && r.wallName === d.wallName ? '' : `Wall: ${r.wallName}. `}Fault: ${faultLabels[r.fault]}. Action: ${actionLabels[r.action]}.`,
    ];
    if (r.cabinetSerial) lines.push(`Cabinet: ${r.cabinetSerial}`);
    if (r.part) lines.push(`Part fitted: ${r.part.name}${r.part.batch ? `, batch ${r.part.batch}` : ''}`);
    if (r.replacementCabinet) lines.push(`Replacement cabinet: ${r.replacementCabinet.serial}`);
    if (r.removedPartFate !== 'none') lines.push(`Removed part: ${fateLabels[r.removedPartFate].toLowerCase()}`);
    lines.push(`${r.technicianName ?? 'Technician'}, ${localTime(new Date(r.performedAt), d.timeZone)}`);
    doc.fillColor(INK).text(winAnsi(lines.join('\n')), { indent: 12 });
    photosFor(doc, d.photos, r.id, images, width);
    doc.moveDown(0.5);
  }
  const loose = d.photos.filter((p) => !p.repairId || !d.repairs.some((r) => r.id === p.repairId));
  if (loose.length) {
    heading('Photos');
    photosFor(doc, loose, null, images, width);
  }

  // Summary and sign-off
  heading('Summary');
  doc.text(winAnsi(d.visit.summary || '—'), { width });
  heading('Sign-off');
  if (d.visit.signedAt) {
    // Visits signed on paper before the pad was used have a name and a time but no drawing.
    if (d.signature && isDecodablePng(d.signature)) {
      ensureRoom(doc, 110);
      doc.image(d.signature, MARGIN, doc.y, { fit: [220, 80] });
      doc.y += 85;
      doc.x = MARGIN;
    }
    doc.text(winAnsi(`Signed by ${d.visit.signedByName ?? 'the client’s contact'}, ${localTime(d.visit.signedAt, d.timeZone)}`));
  } else {
    doc.text(winAnsi(`Not signed${d.visit.unsignedReason ? `: ${d.visit.unsignedReason}` : '.'}`));
  }

  doc.end();
  await done;
  return Buffer.concat(chunks);
}

/** Starts a new page when less than `height` points are left. */
function ensureRoom(doc: PDFKit.PDFDocument, height: number) {
  if (doc.y + height > doc.page.height - MARGIN) doc.addPage();
}

const PHOTO_W = 150;
const PHOTO_H = 112;

/** The photos of one repair (or the loose ones): images in a row of thumbnails, other files by name. */
function photosFor(
  doc: PDFKit.PDFDocument,
  photos: ReportData['photos'],
  repairId: string | null,
  images: Map<string, Buffer>,
  width: number,
) {
  const mine = photos.filter((p) => repairId === null || p.repairId === repairId);
  const drawn = mine.filter((p) => images.has(p.storageKey));
  const listed = mine.filter((p) => !images.has(p.storageKey));
  const perRow = Math.max(1, Math.floor((width + 10) / (PHOTO_W + 10)));
  for (let i = 0; i < drawn.length; i += perRow) {
    ensureRoom(doc, PHOTO_H + 10);
    const y = doc.y + 4;
    drawn.slice(i, i + perRow).forEach((p, j) => {
      try {
        doc.image(images.get(p.storageKey)!, MARGIN + j * (PHOTO_W + 10), y, { fit: [PHOTO_W, PHOTO_H] });
      } catch {
        listed.push(p);
      }
    });
    doc.y = y + PHOTO_H + 4;
    doc.x = MARGIN;
  }
  if (listed.length) doc.fillColor(MUTED).text(winAnsi(`Files: ${listed.map((p) => p.fileName).join(', ')}`), MARGIN, doc.y, { width });
  doc.fillColor(INK);
}

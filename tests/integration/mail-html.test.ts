// Every message goes out as HTML with a plain-text alternative, laid out for a phone, with the
// writer's words escaped; nobody is mailed their own comment. Messages are read as a mail app
// would: delivered through the outbox to the SMTP fake and parsed with mailparser. This file has
// a database of its own so no other test's queued mail is sent from here.
import { eq, like } from 'drizzle-orm';
import type { ParsedMail } from 'mailparser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../server/db/client.js';
import { contacts, sites } from '../../server/db/schema/clients.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import { closeMail } from '../../server/integrations/mail.js';
import { requestPasswordReset } from '../../server/services/auth.js';
import { createOrganisation, createUser, signIn, signedIn, unique, type Session } from '../factories/index.js';
import { deliverMail } from '../setup/deliver-mail.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';
import { setEnv, startTestSmtp, type ParsedReceivedMail, type TestSmtp } from '../setup/fakes.js';

const APP_URL = 'https://portal.integrator.test';
/** A title a browser would run, and an ampersand that must become an entity. */
const HOSTILE_TITLE = '<script>alert("x")</script> Flicker & tearing';

let smtp: TestSmtp;
let database: Awaited<ReturnType<typeof createIsolatedDatabase>>;
let restoreEnv: () => void;
let office: Session;
let org: Awaited<ReturnType<typeof createOrganisation>>;

beforeAll(async () => {
  [smtp, database] = await Promise.all([startTestSmtp(), createIsolatedDatabase('gridkeep_mail_html')]);
  restoreEnv = setEnv({ DATABASE_URL: database.url, ...smtp.env, OFFICE_EMAIL: 'desk@integrator.test', APP_URL });
  org = await createOrganisation({ withWall: true });
  await db()
    .update(sites)
    .set({ address: '1200 Harbour Road', city: 'Portside', region: 'IL', postalCode: '60601', country: 'USA' })
    .where(eq(sites.id, org.site.id));
  await db()
    .insert(contacts)
    .values({ clientId: org.client.id, siteId: org.site.id, name: 'Site manager', email: 'site.manager@client.test' });
  office = await signedIn('coordinator');
});

afterAll(async () => {
  closeMail();
  await closeDb();
  await smtp.dispose();
  restoreEnv();
  await database.drop();
});

async function openTicket(session: Session, title: string, description = '') {
  const res = await session.post('/api/tickets', {
    siteId: org.site.id,
    wallId: org.wall!.id,
    cells: [
      { column: 4, row: 2 },
      { column: 5, row: 2 },
    ],
    title,
    ...(description ? { description } : {}),
    priority: 'high',
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: string; ref: string };
}

/** Delivered messages whose subject matches. */
async function delivered(subject: RegExp) {
  return (await deliverMail(smtp)).filter((m) => subject.test(m.mail.subject ?? ''));
}

const textOf = (m: ParsedMail) => m.text ?? '';
const htmlOf = (m: ParsedMail) => (typeof m.html === 'string' ? m.html : '');
const recipients = (m: ParsedReceivedMail) => m.received.envelope.to.map((a) => a.toLowerCase()).sort();

/** The anchor tag pointing at `url` (its `&` written as an entity, as in any attribute). */
function linkTo(html: string, url: string) {
  const href = url.replace(/&/g, '(?:&|&amp;|&#38;)').replace(/[?.]/g, '\\$&');
  return new RegExp(`<a [^>]*href="${href}"[^>]*>`).exec(html)?.[0];
}

/** The height a link drawn as a button takes: its line height plus top and bottom padding, in px. */
function buttonHeight(anchor: string) {
  const style = /style="([^"]*)"/.exec(anchor)?.[1] ?? '';
  const px = (name: string) => Number(new RegExp(`(?:^|;)\\s*${name}:\\s*(\\d+)px`).exec(style)?.[1] ?? 0);
  const padding = /(?:^|;)\s*padding:\s*(\d+)px/.exec(style);
  const vertical = padding ? 2 * Number(padding[1]) : px('padding-top') + px('padding-bottom');
  return px('line-height') + vertical;
}

/** What a mail app needs for a phone: both parts, the viewport, one column ≤ 600 px, inline styles. */
function expectPhoneLayout(mail: ParsedMail) {
  expect(textOf(mail).trim().length).toBeGreaterThan(0);
  const html = htmlOf(mail);
  expect(html).toMatch(/<meta name="viewport" content="width=device-width/);
  expect(html).toMatch(/max-width:\s*600px/);
  // Many mail apps drop a <style> block: every style is inline.
  expect(html).not.toMatch(/<style[\s>]/i);
  expect(html).not.toMatch(/<link[^>]+stylesheet/i);
}

describe('ticket mail', () => {
  it('goes out as HTML and text, both with the reference, state, cells and a portal button; user text is escaped', async () => {
    const reporter = await signIn(await createUser({ role: 'client', clientId: org.client.id, name: 'Dana & <b>Co</b>' }));
    const t = await openTicket(reporter, HOSTILE_TITLE, 'Black square <img src=x onerror=alert(1)> lower left');
    await office.patch(`/api/tickets/${t.id}`, { status: 'acknowledged' });

    const link = `${APP_URL}/tickets/${t.id}`;
    const opened = await delivered(new RegExp(`^New high ticket ${t.ref}:`));
    const acknowledged = await delivered(new RegExp(`^We are on it: ${t.ref} `));
    expect(opened).toHaveLength(1);
    expect(acknowledged).toHaveLength(1);

    for (const [{ mail }, state] of [
      [opened[0], 'New'],
      [acknowledged[0], 'Acknowledged'],
    ] as const) {
      expectPhoneLayout(mail);
      const text = textOf(mail);
      const html = htmlOf(mail);
      for (const part of [text, html]) {
        expect(part).toContain(t.ref);
        expect(part).toContain(link);
        expect(part).toContain(state);
        expect(part).toContain('C4·R2, C5·R2');
      }
      // The portal link is a button a thumb can hit: at least 44 px tall (WCAG 2.2 SC 2.5.5).
      const button = linkTo(html, link);
      expect(button, 'a link to the ticket').toBeDefined();
      expect(buttonHeight(button!)).toBeGreaterThanOrEqual(44);
      // The text part carries the title as written; the HTML only as entities.
      expect(text).toContain(HOSTILE_TITLE);
      expect(html).not.toMatch(/<script/i);
      expect(html).toMatch(/(&lt;|&#60;|&#x3c;)script(&gt;|&#62;|&#x3e;)/i);
      expect(html).toMatch(/(&amp;|&#38;|&#x26;) tearing/i);
    }
    // The reporter's name and description reach the office escaped too.
    const officeHtml = htmlOf(opened[0].mail);
    expect(officeHtml).not.toMatch(/<img src=x/);
    expect(officeHtml).not.toMatch(/<b>Co<\/b>/);
    expect(officeHtml).toMatch(/Dana (&amp;|&#38;|&#x26;) /i);
    expect(textOf(opened[0].mail)).toContain('Black square <img src=x onerror=alert(1)> lower left');
  });
});

describe('comments', () => {
  it('never mails a client their own comment, even when they are also a site contact under another spelling', async () => {
    const author = await createUser({ role: 'client', clientId: org.client.id, name: 'Rowan Client' });
    // The same person listed as a site contact, their address typed with capitals.
    const [local, domain] = author.email.split('@');
    await db()
      .insert(contacts)
      .values({
        clientId: org.client.id,
        siteId: org.site.id,
        name: 'Rowan Client',
        email: `${local.toUpperCase()}@${domain.toUpperCase()}`,
      });
    const session = await signIn(author);
    const t = await openTicket(session, 'Own words check');
    const body = 'Still dark <em>after</em> the reboot & the reset';
    const res = await session.post(`/api/tickets/${t.id}/comments`, { body, visibility: 'public' });
    expect(res.status).toBe(201);

    const replies = await delivered(new RegExp(`^New reply on ${t.ref}:`));
    expect(replies).toHaveLength(1);
    expect(recipients(replies[0])).not.toContain(author.email);
    expect(recipients(replies[0])).toContain('site.manager@client.test');
    const { mail } = replies[0];
    expect(textOf(mail)).toContain(body);
    expect(htmlOf(mail)).not.toContain('<em>after</em>');
    expect(htmlOf(mail)).toMatch(/(&amp;|&#38;|&#x26;) the reset/i);
    expect(linkTo(htmlOf(mail), `${APP_URL}/tickets/${t.id}`)).toBeDefined();
  });

  it('never mails office staff their own public comment when their address is also a contact', async () => {
    const staff = await signedIn('coordinator');
    await db()
      .insert(contacts)
      .values({ clientId: org.client.id, siteId: org.site.id, name: 'Desk alias', email: staff.user.email.toUpperCase() });
    const t = await openTicket(await signedIn('client', org.client.id), 'Staff own words check');
    const res = await staff.post(`/api/tickets/${t.id}/comments`, { body: 'The module ships tomorrow.', visibility: 'public' });
    expect(res.status).toBe(201);

    const replies = await delivered(new RegExp(`^New reply on ${t.ref}:`));
    expect(replies).toHaveLength(1);
    expect(recipients(replies[0])).not.toContain(staff.user.email);
    expect(recipients(replies[0])).toContain('site.manager@client.test');
  });

  it('never mails a client their own reply through a contact linked to their account under another address', async () => {
    const author = await createUser({ role: 'client', clientId: org.client.id, name: 'Hollis Linked' });
    // Listed under a personal address; signs in under the team's portal address.
    const personal = `${unique('h.linked')}@client.test`;
    const linked = await office.post('/api/contacts', {
      clientId: org.client.id,
      siteId: org.site.id,
      name: 'Hollis Linked',
      email: personal,
      userId: author.id,
    });
    expect(linked.status, JSON.stringify(linked.body)).toBe(201);
    expect(linked.body.userId).toBe(author.id);
    const detail = await office.get(`/api/clients/${org.client.id}`);
    expect(detail.body.contacts.find((c: { id: string }) => c.id === linked.body.id)?.userId).toBe(author.id);
    expect(detail.body.users.map((u: { id: string }) => u.id)).toContain(author.id);

    const session = await signIn(author);
    const t = await openTicket(session, 'Linked contact check');
    const res = await session.post(`/api/tickets/${t.id}/comments`, { body: 'Still dark.', visibility: 'public' });
    expect(res.status).toBe(201);

    const replies = await delivered(new RegExp(`^New reply on ${t.ref}:`));
    expect(replies).toHaveLength(1);
    expect(recipients(replies[0])).not.toContain(personal);
    expect(recipients(replies[0])).not.toContain(author.email);
    expect(recipients(replies[0])).toContain('site.manager@client.test');

    // When the office replies, the linked contact hears about it like anyone else.
    await office.post(`/api/tickets/${t.id}/comments`, { body: 'On our way.', visibility: 'public' });
    const officeReplies = (await delivered(new RegExp(`^New reply on ${t.ref}:`))).filter((m) => textOf(m.mail).includes('On our way.'));
    expect(officeReplies).toHaveLength(1);
    expect(recipients(officeReplies[0])).toContain(personal);
  });

  it('links a contact only to a user of the same organisation, and to one contact of it', async () => {
    const other = await createOrganisation();
    const stranger = await createUser({ role: 'client', clientId: other.client.id });
    const refused = await office.post('/api/contacts', { clientId: org.client.id, name: 'Wrong link', userId: stranger.id });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.userId).toBe('Not a user of this client.');
    const staffUser = await signedIn('technician');
    const staffLink = await office.post('/api/contacts', { clientId: org.client.id, name: 'Staff link', userId: staffUser.user.id });
    expect(staffLink.status).toBe(400);

    const mine = await createUser({ role: 'client', clientId: org.client.id });
    const first = await office.post('/api/contacts', { clientId: org.client.id, name: 'First link', userId: mine.id });
    expect(first.status).toBe(201);
    const second = await office.post('/api/contacts', { clientId: org.client.id, name: 'Second link' });
    const taken = await office.patch(`/api/contacts/${second.body.id}`, { userId: mine.id });
    expect(taken.status).toBe(409);
    expect(taken.body.error.code).toBe('user_linked');
    const cleared = await office.patch(`/api/contacts/${first.body.id}`, { userId: null });
    expect(cleared.status).toBe(200);
    expect(cleared.body.userId).toBeNull();

    const clientView = await (await signIn(mine)).get(`/api/clients/${org.client.id}`);
    expect(clientView.status).toBe(200);
    expect(clientView.body.users).toBeUndefined();
  });

  it('mails each client address once, however its contact entry is spelt', async () => {
    const reporter = await createUser({ role: 'client', clientId: org.client.id });
    await db()
      .insert(contacts)
      .values({ clientId: org.client.id, siteId: org.site.id, name: 'Reporter again', email: reporter.email.toUpperCase() });
    const t = await openTicket(await signIn(reporter), 'One copy each');
    await office.post(`/api/tickets/${t.id}/comments`, { body: 'On our way.', visibility: 'public' });

    // Read from the outbox: the SMTP client would fold the two spellings into one envelope anyway.
    const [reply] = await db()
      .select()
      .from(outboundMail)
      .where(like(outboundMail.dedupeKey, `ticket:${t.id}:comment:%`));
    expect(reply.to.filter((a) => a.toLowerCase() === reporter.email)).toHaveLength(1);
  });
});

describe('visit mail', () => {
  it("shows the window at the site, the address and the technicians in both parts, with the technicians' names escaped", async () => {
    const tech = await createUser({ role: 'technician', name: `Ada <Rivet> & Sons ${unique('')}` });
    const t = await openTicket(await signedIn('client', org.client.id), 'Visit mail check');
    const res = await office.post('/api/visits', {
      kind: 'ticket',
      ticketId: t.id,
      windowStart: '2027-03-09T15:00:00Z',
      windowEnd: '2027-03-09T17:00:00Z',
      technicianIds: [tech.id],
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);

    const [client] = await delivered(new RegExp(`^Visit scheduled for ${t.ref}:`));
    const [technician] = await delivered(new RegExp(`^New visit for you: .*${t.ref}:`));
    expect(client).toBeDefined();
    expect(technician).toBeDefined();
    // 15:00 UTC on 9 March 2027 is 9:00 AM in Chicago (CST, UTC−6; DST starts on 14 March).
    const window = /Tuesday, March 9, 2027, 9:00\s?AM CST – 11:00\s?AM CST/;
    for (const { mail } of [client, technician]) {
      expectPhoneLayout(mail);
      for (const part of [textOf(mail), htmlOf(mail)]) {
        expect(part).toMatch(window);
        expect(part).toContain('1200 Harbour Road, Portside, IL 60601, USA');
        expect(part).toContain(t.ref);
      }
      expect(textOf(mail)).toContain(tech.name);
      expect(htmlOf(mail)).not.toContain('<Rivet>');
      expect(htmlOf(mail)).toMatch(/Ada (&lt;|&#60;)Rivet(&gt;|&#62;) (&amp;|&#38;) Sons/);
      // The calendar file still travels with it.
      expect(mail.attachments.some((a) => a.contentType.startsWith('text/calendar'))).toBe(true);
    }
    expect(linkTo(htmlOf(client.mail), `${APP_URL}/tickets/${t.id}`)).toBeDefined();
    expect(linkTo(htmlOf(technician.mail), `${APP_URL}/visits/${res.body.id}`)).toBeDefined();
  });
});

describe('account mail', () => {
  it('a password reset carries its link as a button in HTML and as a link in text', async () => {
    const user = await createUser({ role: 'coordinator', name: 'Reset & Co' });
    await requestPasswordReset(user.email);
    const [reset] = (await delivered(/^Reset your Gridkeep password$/)).filter((m) => recipients(m).includes(user.email));
    expect(reset).toBeDefined();
    expectPhoneLayout(reset.mail);
    const url = /(https:\/\/portal\.integrator\.test\/set-password\?token=[\w%-]+)/.exec(textOf(reset.mail))?.[1];
    expect(url).toBeDefined();
    const button = linkTo(htmlOf(reset.mail), url!);
    expect(button).toBeDefined();
    expect(buttonHeight(button!)).toBeGreaterThanOrEqual(44);
    expect(htmlOf(reset.mail)).toMatch(/Reset (&amp;|&#38;) Co/);
  });
});

import { describe, expect, it } from 'vitest';
import type { AuditEventView } from '../../shared/schemas/users.js';
import { db } from '../../server/db/client.js';
import { auditEvents } from '../../server/db/schema/accounts.js';
import { cabinets } from '../../server/db/schema/walls.js';
import { recordAudit } from '../../server/services/audit.js';
import { anonymous, createOrganisation, signedIn, unique } from '../factories/index.js';

// The audit log names its records (a client's name, a cabinet's serial, a ticket's reference)
// with their pages, names the records its changed fields point at, and never shows a secret.

async function historyOf(admin: Awaited<ReturnType<typeof signedIn>>, entityId: string): Promise<AuditEventView[]> {
  const res = await admin.get(`/api/audit?entityId=${entityId}`);
  expect(res.status).toBe(200);
  return res.body.items as AuditEventView[];
}

describe('GET /api/audit', () => {
  it('answers 401 signed out, and only to admins', async () => {
    expect((await anonymous().get('/api/audit')).status).toBe(401);
    const coordinator = await signedIn('coordinator');
    expect((await coordinator.get('/api/audit')).status).not.toBe(200);
    const org = await createOrganisation();
    const client = await signedIn('client', org.client.id);
    expect((await client.get('/api/audit')).status).toBe(404);
  });

  it('names a client by its current name, links its page, and shows only the changed field', async () => {
    const admin = await signedIn('admin');
    const { client } = await createOrganisation();
    const renamed = unique('Renamed client');
    expect((await admin.patch(`/api/clients/${client.id}`, { name: renamed })).status).toBe(200);
    const [event] = await historyOf(admin, client.id);
    expect(event).toMatchObject({
      entity: 'client',
      action: 'updated',
      record: { name: renamed, page: { kind: 'client', id: client.id } },
      before: { name: client.name },
      after: { name: renamed },
    });
  });

  it('names a ticket by its reference and the records its fields point at, without its own id and times', async () => {
    const admin = await signedIn('admin');
    const { client, site, wall } = await createOrganisation({ withWall: true });
    const created = await admin.post('/api/tickets', {
      siteId: site.id,
      wallId: wall!.id,
      cells: [{ column: 1, row: 1 }],
      title: 'Dark row',
      priority: 'high',
    });
    expect(created.status).toBe(201);
    const [event] = await historyOf(admin, created.body.id);
    expect(event.record).toEqual({ name: created.body.ref, context: 'Dark row', page: { kind: 'ticket', id: created.body.id } });
    const after = event.after as Record<string, unknown>;
    expect(after).toMatchObject({ clientId: client.id, siteId: site.id, wallId: wall!.id, title: 'Dark row' });
    for (const own of ['id', 'createdAt', 'updatedAt']) expect(after).not.toHaveProperty(own);
    expect(event.references[client.id]).toEqual({ name: client.name, context: null, page: { kind: 'client', id: client.id } });
    expect(event.references[site.id]).toEqual({ name: site.name, context: client.name, page: { kind: 'site', id: site.id } });
    expect(event.references[wall!.id]).toEqual({ name: wall!.name, context: site.name, page: { kind: 'wall', id: wall!.id } });
    expect(event.references[admin.user.id]).toMatchObject({ name: admin.user.name, page: { kind: 'user', email: admin.user.email } });
  });

  it('names a cabinet by its serial, placed by its wall and cell (C3·R2), its page its label address', async () => {
    const admin = await signedIn('admin');
    const { wall } = await createOrganisation({ withWall: true });
    const serial = unique('SN');
    const [cabinet] = await db()
      .insert(cabinets)
      .values({ serial, cabinetModelId: wall!.cabinetModelId, wallId: wall!.id, column: 3, row: 2 })
      .returning();
    await recordAudit(db(), {
      actor: null,
      entity: 'cabinet',
      entityId: cabinet.id,
      action: 'moved',
      before: { wallId: null, column: null, row: null },
      after: { wallId: wall!.id, column: 3, row: 2 },
    });
    const [event] = await historyOf(admin, cabinet.id);
    expect(event.record).toEqual({ name: serial, context: `${wall!.name}, C3·R2`, page: { kind: 'cabinet', serial } });
    expect(event.references[wall!.id]).toMatchObject({ name: wall!.name });
  });

  it('never shows a password hash or a storage key, even one an older row still holds', async () => {
    const admin = await signedIn('admin');
    const target = await signedIn('technician');
    // Written straight into the table, as a row from before secrets were dropped at write time would be.
    await db()
      .insert(auditEvents)
      .values({
        entity: 'user',
        entityId: target.user.id,
        action: 'updated',
        before: { name: 'Old name', passwordHash: '$argon2id$v=19$secret', tokenHash: 'abc', storageKey: 'files/x' },
        after: { name: target.user.name, passwordHash: '$argon2id$v=19$other' },
      });
    const [event] = await historyOf(admin, target.user.id);
    expect(event.record).toMatchObject({ name: target.user.name, page: { kind: 'user', email: target.user.email } });
    expect(event.before).toEqual({ name: 'Old name' });
    expect(event.after).toEqual({ name: target.user.name });
    expect(JSON.stringify(event)).not.toMatch(/argon2|storageKey|tokenHash/);
  });

  it('keeps the name of a removed record from its last snapshot, with no page', async () => {
    const admin = await signedIn('admin');
    const { client } = await createOrganisation();
    const contact = await admin.post('/api/contacts', { clientId: client.id, name: 'Departed contact' });
    expect(contact.status).toBe(201);
    expect((await admin.delete(`/api/contacts/${contact.body.id}`)).status).toBe(204);
    const [removed, added] = await historyOf(admin, contact.body.id);
    expect(removed.action).toBe('deleted');
    expect(removed.record).toEqual({ name: 'Departed contact', context: null, page: null });
    expect(added.action).toBe('created');
  });
});

import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { users } from '../../server/db/schema/accounts.js';
import { anonymous, createOrganisation, createUser, signedIn, signIn } from '../factories/index.js';

interface StaffRow {
  id: string;
  name: string;
  role: string;
}

// The product's roles (design/product.md): coordinators assign tickets and plan visits, so they
// need the team's names; client users never see the staff list.
describe('GET /api/staff', () => {
  it('lists active staff for a coordinator, without clients or disabled accounts', async () => {
    const office = await signedIn('coordinator');
    const tech = await createUser({ role: 'technician', name: 'Staff list technician' });
    const gone = await createUser({ role: 'technician', name: 'Staff list leaver' });
    await db().update(users).set({ disabledAt: new Date() }).where(eq(users.id, gone.id));
    const org = await createOrganisation();
    const clientUser = await createUser({ role: 'client', clientId: org.client.id });

    const res = await office.get('/api/staff');
    expect(res.status).toBe(200);
    const items = res.body.items as StaffRow[];
    expect(items).toContainEqual({ id: tech.id, name: 'Staff list technician', role: 'technician' });
    expect(items.map((u) => u.id)).toContain(office.user.id);
    expect(items.map((u) => u.id)).not.toContain(gone.id);
    expect(items.map((u) => u.id)).not.toContain(clientUser.id);
    expect(items.every((u) => u.role !== 'client')).toBe(true);
    // Only what a picker needs: no e-mail addresses, phones or password state.
    for (const row of items) expect(Object.keys(row).sort()).toEqual(['id', 'name', 'role']);
    // Sorted by name, as a picker shows them.
    const names = items.map((u) => u.name);
    expect(names).toEqual([...names].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0)));
  });

  it('is open to technicians too', async () => {
    const tech = await signedIn('technician');
    const res = await tech.get('/api/staff');
    expect(res.status).toBe(200);
    expect((res.body.items as StaffRow[]).map((u) => u.id)).toContain(tech.user.id);
  });

  it('answers 404 to a client user and 401 without a session', async () => {
    const org = await createOrganisation();
    const clientUser = await signIn(await createUser({ role: 'client', clientId: org.client.id }));
    const res = await clientUser.get('/api/staff');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    const anon = await anonymous().get('/api/staff');
    expect(anon.status).toBe(401);
  });
});

// The demo's organisations, accounts and catalogue: service plans, clients, sites and their
// contacts, staff and client users, cabinet models, parts and stock locations.
import { entries, type Demo } from './build-context.js';
import {
  clientSpecs,
  clientUsers,
  company,
  locationSpecs,
  modelSpecs,
  partSpecs,
  plans,
  siteSpecs,
  staffUsers,
  type LocationKey,
  type SiteKey,
} from './register.js';

/** The site kit (spares kept on site) of each site that has one. */
export const kitAt: Partial<Record<SiteKey, LocationKey>> = {};
for (const [k, l] of entries(locationSpecs)) {
  if (l.site) kitAt[l.site] = k;
}

/** Each technician's van. */
export const vanOf = { tech1: 'van1', tech2: 'van2' } as const satisfies Record<'tech1' | 'tech2', LocationKey>;

/** Service plans, clients with their contacts, and sites with their own contact. */
export function addOrganisations({ rows, id, longAgo, ids }: Demo) {
  for (const [k, p] of entries(plans)) {
    ids.plan[k] = id();
    rows.servicePlans.push({ id: ids.plan[k], ...p, createdAt: longAgo, updatedAt: longAgo });
  }
  for (const [k, c] of entries(clientSpecs)) {
    ids.client[k] = id();
    rows.clients.push({
      id: ids.client[k],
      name: c.name,
      servicePlanId: ids.plan[c.plan],
      notes: c.notes,
      createdAt: longAgo,
      updatedAt: longAgo,
    });
    for (const contact of c.contacts) {
      rows.contacts.push({
        id: id(),
        clientId: ids.client[k],
        siteId: null,
        receivesUpdates: true,
        ...contact,
        createdAt: longAgo,
        updatedAt: longAgo,
      });
    }
  }
  for (const [k, s] of entries(siteSpecs)) {
    ids.site[k] = id();
    rows.sites.push({
      id: ids.site[k],
      clientId: ids.client[s.client],
      name: s.name,
      address: s.address,
      city: s.city,
      region: s.region,
      postalCode: s.postalCode,
      country: 'US',
      timeZone: s.timeZone,
      accessNotes: s.accessNotes,
      internalNotes: s.internalNotes ?? '',
      createdAt: longAgo,
      updatedAt: longAgo,
    });
    rows.contacts.push({
      id: id(),
      clientId: ids.client[s.client],
      siteId: ids.site[k],
      receivesUpdates: true,
      ...s.contact,
      createdAt: longAgo,
      updatedAt: longAgo,
    });
  }
}

/** Staff and client accounts, all with the one password hash. */
export function addAccounts({ rows, rand, clock, id, ids }: Demo, passwordHash: string) {
  const joined = clock.at(company.defaultTimeZone, -420, 9);
  for (const [k, u] of entries(staffUsers)) {
    ids.user[k] = id();
    ids.userName[k] = u.name;
    rows.users.push({
      id: ids.user[k],
      email: u.email,
      name: u.name,
      role: u.role,
      clientId: null,
      phone: u.phone,
      passwordHash,
      passwordChangedAt: joined,
      lastSignInAt: clock.hoursAgo(rand.int(1, 30)),
      createdAt: joined,
      updatedAt: joined,
    });
  }
  for (const [k, u] of entries(clientUsers)) {
    ids.user[k] = id();
    ids.userName[k] = u.name;
    rows.users.push({
      id: ids.user[k],
      email: u.email,
      name: u.name,
      role: 'client',
      clientId: ids.client[u.client],
      phone: u.phone,
      passwordHash,
      passwordChangedAt: joined,
      lastSignInAt: clock.hoursAgo(rand.int(20, 300)),
      createdAt: joined,
      updatedAt: joined,
    });
    // The contact of the same name signs in under the portal address (e.g. av@…, not their own).
    const contact = rows.contacts.find((c) => c.clientId === ids.client[u.client] && c.name === u.name && !c.userId);
    if (contact) contact.userId = ids.user[k];
  }
}

/** Cabinet models, parts and stock locations (the warehouse, the vans, the site kits). */
export function addCatalogue({ rows, id, longAgo, ids }: Demo) {
  for (const [k, m] of entries(modelSpecs)) {
    ids.model[k] = id();
    const { serialPrefix: _s, batchPrefix: _b, ...spec } = m;
    rows.cabinetModels.push({ id: ids.model[k], ...spec, createdAt: longAgo, updatedAt: longAgo });
  }
  for (const [k, p] of entries(partSpecs)) {
    ids.part[k] = id();
    rows.parts.push({
      id: ids.part[k],
      sku: p.sku,
      name: p.name,
      kind: p.kind,
      cabinetModelId: p.model ? ids.model[p.model] : null,
      unitCost: p.unitCost,
      leadTimeDays: p.leadTimeDays,
      createdAt: longAgo,
      updatedAt: longAgo,
    });
  }
  for (const [k, l] of entries(locationSpecs)) {
    ids.location[k] = id();
    rows.stockLocations.push({
      id: ids.location[k],
      name: l.name,
      kind: l.kind,
      holderId: l.holder ? ids.user[l.holder] : null,
      siteId: l.site ? ids.site[l.site] : null,
      clientId: l.site ? ids.client[siteSpecs[l.site].client] : null,
      createdAt: longAgo,
      updatedAt: longAgo,
    });
  }
}

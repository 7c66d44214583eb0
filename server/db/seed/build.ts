// Turns the demo's story (register.ts, work.ts) into table rows, with every cross-reference,
// timestamp and stock quantity consistent. Pure: no database access. Every id and random choice
// comes from one seeded generator, so the steps run in this order and the demo is the same on
// every run for the same moment.
import { demoAuditTrail } from './audit-trail.js';
import { addAtticStock, addWalls, createCabinetLog } from './build-cabinets.js';
import { startDemo, type DemoRows } from './build-context.js';
import { addMaintenance } from './build-maintenance.js';
import { addAccounts, addCatalogue, addOrganisations } from './build-register.js';
import { createWorkLog, followRecalibrations } from './build-repairs.js';
import { addDeadOnArrivalReturn, addReorderPoints, openingStock, settleStock } from './build-stock.js';
import { addTickets } from './build-tickets.js';

export type { DemoRows } from './build-context.js';

export function buildDemo(now: Date, passwordHash: string): DemoRows {
  const demo = startDemo(now);
  addOrganisations(demo);
  addAccounts(demo, passwordHash);
  addCatalogue(demo);

  const cabinets = createCabinetLog(demo);
  const wallBatches = addWalls(demo, cabinets);
  const kitSpareCabinet = addAtticStock(demo, cabinets, wallBatches);

  const stock = openingStock(demo, wallBatches);
  addDeadOnArrivalReturn(demo, stock);

  const work = createWorkLog(demo, { cabinets, stock, kitSpareCabinet, wallBatches });
  addTickets(demo, work);
  followRecalibrations(demo);
  addMaintenance(demo, work);

  addReorderPoints(demo, settleStock(demo, stock));
  demo.rows.auditEvents = demoAuditTrail(demo.rows, demo.ids.user.office);
  return demo.rows;
}

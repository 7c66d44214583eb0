// Used only by scripts/check-tenant-tests.ts: with GRIDKEEP_DROP_TENANT_FILTER=1, the tenant
// filter (server/services/scope.ts tenantWhere) keeps nothing out, as if every scoped query had
// lost its organisation filter. The tenant tests must then fail; the script checks that they do.
// Without the variable this file does nothing, and production code carries no test switch.
import { vi } from 'vitest';
import type * as Scope from '../../server/services/scope.js';

if (process.env.GRIDKEEP_DROP_TENANT_FILTER === '1') {
  vi.doMock('../../server/services/scope.js', async (importOriginal) => ({
    ...(await importOriginal<typeof Scope>()),
    tenantWhere: () => undefined,
  }));
}

/** Query keys of the catalogue: cabinet models and controllers. */
export const catalogueKeys = {
  all: ['catalogue'] as const,
  models: () => [...catalogueKeys.all, 'models'] as const,
  controllers: (wallId?: string) => [...catalogueKeys.all, 'controllers', wallId ?? 'all'] as const,
};

/** A controller change shows on its wall's page too (named, not imported). */
export const controllerOwnerKeys = [catalogueKeys.all, ['walls'] as const];

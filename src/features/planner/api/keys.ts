/**
 * Query keys of the planner. Walls are filed under the register's root key (`['walls']`), so a
 * saved plan (which invalidates `['walls']`) refreshes every wall screen too.
 */
export const plannerKeys = {
  cabinetModels: () => ['cabinet-models', 'list'] as const,
  wallChoices: (cabinetModelId: string) => ['walls', 'plan-choices', cabinetModelId] as const,
  wallPlan: (wallId: string) => ['walls', 'plan', wallId] as const,
};

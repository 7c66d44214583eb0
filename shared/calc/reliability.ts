// Failure rates and mean time between failures from repair history.

/** Exposure: modules × months in service, in module-months. */
export function moduleMonths(modules: number, months: number): number {
  return modules * months;
}

/** Failures per module-month: failures ÷ module-months. */
export function failuresPerModuleMonth(failures: number, exposureModuleMonths: number): number {
  if (!(exposureModuleMonths > 0)) throw new RangeError('Exposure must be positive.');
  return failures / exposureModuleMonths;
}

/** The trade's usual rate figure: failures per 1,000 module-months = 1,000 × failures ÷ module-months. */
export function failuresPerThousandModuleMonths(failures: number, exposureModuleMonths: number): number {
  return 1000 * failuresPerModuleMonth(failures, exposureModuleMonths);
}

/**
 * Mean time between failures in module-months: exposure ÷ failures (the reciprocal of the
 * rate). Null when nothing has failed yet: the MTBF is then only known to exceed the exposure.
 */
export function mtbfModuleMonths(failures: number, exposureModuleMonths: number): number | null {
  if (!(exposureModuleMonths > 0)) throw new RangeError('Exposure must be positive.');
  return failures > 0 ? exposureModuleMonths / failures : null;
}

/**
 * Mean time between failures in operating hours per module: modules × operating hours ÷
 * failures. Null when nothing has failed yet.
 */
export function mtbfHours(failures: number, modules: number, operatingHours: number): number | null {
  if (!(modules > 0 && operatingHours > 0)) throw new RangeError('Modules and hours must be positive.');
  return failures > 0 ? (modules * operatingHours) / failures : null;
}

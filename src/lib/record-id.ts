const recordIdPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Whether a value from an address is a record id (a UUID), before it is sent to the API. */
export const isRecordId = (value: string): boolean => recordIdPattern.test(value);

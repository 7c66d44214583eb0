// Every table, for the Drizzle client (server/db/client.ts). drizzle-kit reads the files directly.
export * from './enums.js';
export * from './accounts.js';
export * from './clients.js';
export * from './catalogue.js';
export * from './walls.js';
export * from './tickets.js';
export * from './visits.js';
export * from './stock.js';
export * from './files.js';
export * from './mail.js';

// Types for database.mjs.
export function ensureDatabase(url: string): Promise<boolean>;

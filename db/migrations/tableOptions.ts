/**
 * Options every migration passes to createTable. Written once and never changed: a later
 * change of table options belongs in a new migration, not here.
 */
export const tableOptions = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci', engine: 'InnoDB' } as const;

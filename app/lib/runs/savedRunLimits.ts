/**
 * Size limits for saving a run, shared by the page (which decides what to send) and the
 * route handler (which enforces them). MariaDB's `max_allowed_packet` is set to 64 MiB in
 * db/scripts/mariadb.sh, above the largest INSERT these limits allow (vector blob + JSON).
 */
const MiB = 1024 * 1024;

/** Compressed CI vectors (all roots) stored per run; above it only the leading determinants are kept. */
export const MAX_VECTOR_COMPRESSED_BYTES = 16 * MiB;
/** Uncompressed size the server will inflate to (8 Mi float64 values), so a small blob cannot expand without bound. */
export const MAX_VECTOR_VALUES = 8 * MiB;
/** The run file and the result (without vectors) together, as JSON text. */
export const MAX_RUN_JSON_BYTES = 4 * MiB;
/** Base64 grows data by 4/3; the rest is the JSON around it (title, tags, field names). */
export const MAX_SAVE_BODY_BYTES = Math.ceil(MAX_VECTOR_COMPRESSED_BYTES / 3) * 4 + MAX_RUN_JSON_BYTES + 64 * 1024;

export const MAX_TAGS_PER_RUN = 12;
export const MAX_TAG_LENGTH = 40;

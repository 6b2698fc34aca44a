import 'server-only';
/**
 * The one place the web app reaches into db/ and models/ (owned by the infra side),
 * so a change of their shape is fixed here only.
 */
export { getModels } from '@/models';
export { getSequelize } from '@/db/connection';

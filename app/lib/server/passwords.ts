import 'server-only';
export { hashPassword, verifyPassword } from '@/db/passwords';

import 'server-only';
export { sendMail } from '@/db/mail';

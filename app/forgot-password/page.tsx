import { ForgotPasswordForm } from '@/components/auth/ForgotPasswordForm';
import { NarrowCard, PageTitle } from '@/components/layout/Page';

export const metadata = { title: 'Forgot password' };

export default function ForgotPasswordPage() {
  return (
    <NarrowCard>
      <PageTitle subtitle="We e-mail a link that lets you choose a new password. It works once, for one hour.">Reset your password</PageTitle>
      <ForgotPasswordForm />
    </NarrowCard>
  );
}

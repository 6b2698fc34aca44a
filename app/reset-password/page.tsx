import Link from 'next/link';
import { ResetPasswordForm } from '@/components/auth/ResetPasswordForm';
import { NarrowCard, PageTitle } from '@/components/layout/Page';
import { tokenField } from '@/app/lib/fields';

export const metadata = { title: 'Choose a new password' };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const valid = tokenField.safeParse(token).success;
  return (
    <NarrowCard>
      <PageTitle>Choose a new password</PageTitle>
      {valid ? (
        <ResetPasswordForm token={token!} />
      ) : (
        <p data-testid="reset-invalid">
          This reset link is incomplete. <Link href="/forgot-password" className="text-ket-600 underline">Ask for a new one</Link>.
        </p>
      )}
    </NarrowCard>
  );
}

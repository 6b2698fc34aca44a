import Link from 'next/link';
import { SignUpForm } from '@/components/auth/SignUpForm';
import { NarrowCard, PageTitle } from '@/components/layout/Page';

export const metadata = { title: 'Sign up' };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ invitation?: string; email?: string }> }) {
  const { invitation, email } = await searchParams;
  return (
    <NarrowCard>
      <PageTitle subtitle={invitation ? 'Create your account with the invited e-mail to join the workspace.' : undefined}>Create your Ketbook account</PageTitle>
      <SignUpForm invitationToken={invitation} email={email} />
      <p className="mt-4 text-sm text-ink-soft">
        Already have an account?{' '}
        <Link href={invitation ? `/invitations/accept?token=${encodeURIComponent(invitation)}` : '/sign-in'} className="text-ket-600 underline">
          Sign in
        </Link>
      </p>
    </NarrowCard>
  );
}

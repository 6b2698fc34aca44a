import Link from 'next/link';
import { SignInForm } from '@/components/auth/SignInForm';
import { NarrowCard, PageTitle } from '@/components/layout/Page';

export const metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; email?: string }> }) {
  const { next, email } = await searchParams;
  return (
    <NarrowCard>
      <PageTitle>Sign in</PageTitle>
      <SignInForm next={next} email={email} />
      <div className="mt-4 flex justify-between text-sm">
        <Link href="/forgot-password" className="text-ket-600 underline" data-testid="forgot-link">
          Forgot your password?
        </Link>
        <Link href="/sign-up" className="text-ket-600 underline">
          Create an account
        </Link>
      </div>
    </NarrowCard>
  );
}

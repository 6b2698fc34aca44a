import { SignOutButton } from '@/components/auth/SignOutButton';
import { NarrowCard, PageTitle } from '@/components/layout/Page';

export const metadata = { title: 'Sign out' };

export default function SignOutPage() {
  return (
    <NarrowCard>
      <PageTitle subtitle="You can sign in again at any time.">Sign out of Ketbook</PageTitle>
      <SignOutButton />
    </NarrowCard>
  );
}

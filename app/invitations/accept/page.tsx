import Link from 'next/link';
import { NarrowCard, PageTitle } from '@/components/layout/Page';
import { AcceptInvitationButton } from '@/components/workspace/AcceptInvitationButton';
import { tokenField } from '@/app/lib/fields';
import { findInvitationByToken } from '@/app/lib/queries/invitations';
import { normaliseEmail } from '@/app/lib/queries/users';
import { findMembership } from '@/app/lib/queries/workspaces';
import { currentUser } from '@/app/lib/server/currentUser';

export const metadata = { title: 'Invitation' };

function Problem({ children }: { children: React.ReactNode }) {
  return (
    <NarrowCard>
      <PageTitle>Invitation</PageTitle>
      <div data-testid="invitation-problem">{children}</div>
    </NarrowCard>
  );
}

export default async function AcceptInvitationPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (!tokenField.safeParse(token).success) return <Problem>This invitation link is incomplete.</Problem>;
  const found = await findInvitationByToken({ token: token! });
  if (!found) return <Problem>This invitation link is not valid.</Problem>;
  const { invitation, workspace, status } = found;
  if (status !== 'pending') {
    const why = { accepted: 'has already been used', revoked: 'was withdrawn', expired: 'has expired' }[status];
    return <Problem>This invitation {why}. Ask an owner of {workspace.name} to send a new one.</Problem>;
  }

  const user = await currentUser();
  const here = `/invitations/accept?token=${encodeURIComponent(token!)}`;
  return (
    <NarrowCard>
      <PageTitle subtitle={`as ${invitation.role}, for ${invitation.email}`}>Join {workspace.name}</PageTitle>
      {!user ? (
        <div className="space-y-3" data-testid="invitation-signed-out">
          <p>To accept, create an account with {invitation.email}, or sign in if you already have one.</p>
          <div className="flex gap-3">
            <Link
              href={`/sign-up?invitation=${encodeURIComponent(token!)}&email=${encodeURIComponent(invitation.email)}`}
              className="rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white hover:bg-ket-700"
              data-testid="invitation-sign-up"
            >
              Sign up and join
            </Link>
            <Link
              href={`/sign-in?next=${encodeURIComponent(here)}&email=${encodeURIComponent(invitation.email)}`}
              className="rounded-md border border-ket-500 px-4 py-2 text-sm font-semibold text-ket-700 hover:bg-ket-50"
              data-testid="invitation-sign-in"
            >
              Sign in
            </Link>
          </div>
        </div>
      ) : normaliseEmail(user.email) !== normaliseEmail(invitation.email) ? (
        <p data-testid="invitation-wrong-account">
          You are signed in as {user.email}, but this invitation is for {invitation.email}.{' '}
          <Link href="/sign-out" className="text-ket-600 underline">Sign out</Link> and use that address.
        </p>
      ) : (await findMembership({ workspaceId: workspace.id, userId: user.id })) ? (
        <p data-testid="invitation-already-member">
          You are already a member. <Link href={`/workspaces/${workspace.slug}`} className="text-ket-600 underline">Open {workspace.name}</Link>.
        </p>
      ) : (
        <AcceptInvitationButton token={token!} />
      )}
    </NarrowCard>
  );
}

import Link from 'next/link';
import { PageTitle, Section } from '@/components/layout/Page';
import { listWorkspacesForUser } from '@/app/lib/queries/workspaces';
import { requirePageUser } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Account' };

export default async function AccountPage() {
  const user = await requirePageUser('/account');
  const workspaces = await listWorkspacesForUser({ userId: user.id, siteRole: user.siteRole });
  const memberOf = workspaces.filter((w) => w.access !== 'observer');
  return (
    <div>
      <PageTitle>Your account</PageTitle>
      <Section title="Profile" testId="account-profile">
        <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-2 text-sm">
          <dt className="text-ink-soft">Name</dt>
          <dd data-testid="account-name">{user.displayName}</dd>
          <dt className="text-ink-soft">E-mail</dt>
          <dd data-testid="account-email">{user.email}</dd>
          <dt className="text-ink-soft">Site role</dt>
          <dd data-testid="account-role">{user.siteRole === 'admin' ? 'site admin' : 'member'}</dd>
          <dt className="text-ink-soft">Joined</dt>
          <dd>{new Date(user.createdAt).toISOString().slice(0, 10)}</dd>
        </dl>
        <p className="mt-4 text-sm">
          To change your password, use <Link href="/forgot-password" className="text-ket-600 underline">the reset link</Link>; it is
          sent to this e-mail address.
        </p>
      </Section>
      <Section title="Workspaces">
        {memberOf.length === 0 ? (
          <p className="text-sm text-ink-soft">You are not a member of any workspace yet.</p>
        ) : (
          <ul className="text-sm">
            {memberOf.map((w) => (
              <li key={w.id}>
                <Link href={`/workspaces/${w.slug}`} className="text-ket-600 underline">
                  {w.name}
                </Link>{' '}
                — {w.access}
              </li>
            ))}
          </ul>
        )}
      </Section>
    </div>
  );
}

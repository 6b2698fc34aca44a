import Link from 'next/link';
import { currentUser } from '@/app/lib/server/currentUser';

function NavLink({ href, children, testId }: { href: string; children: React.ReactNode; testId: string }) {
  return (
    <Link href={href} className="rounded px-2 py-1 text-sm text-ket-50 hover:bg-ket-600" data-testid={testId}>
      {children}
    </Link>
  );
}

/** The site bar: what a visitor may do depends on whether they are signed in and whether they are an admin. */
export async function SiteHeader() {
  const user = await currentUser().catch(() => null);
  return (
    <header className="bg-ket-700 text-white">
      <nav aria-label="Main" className="mx-auto flex max-w-4xl flex-wrap items-center gap-2 px-4 py-3">
        <Link href="/" className="mr-4 flex items-center gap-2 font-bold tracking-tight" data-testid="nav-home">
          <span aria-hidden="true" className="font-mono text-caution-50">|ψ⟩</span> Ketbook
        </Link>
        {user ? (
          <>
            <NavLink href="/workspaces" testId="nav-workspaces">Workspaces</NavLink>
            <NavLink href="/runs" testId="nav-runs">Runs &amp; scans</NavLink>
            {user.siteRole === 'admin' ? (
              <>
                <NavLink href="/admin/outbox" testId="nav-outbox">Outbox</NavLink>
                <NavLink href="/admin/audit" testId="nav-audit">Audit log</NavLink>
              </>
            ) : null}
            <span className="ml-auto" />
            <NavLink href="/account" testId="nav-account">{user.displayName}</NavLink>
            <NavLink href="/sign-out" testId="nav-sign-out">Sign out</NavLink>
          </>
        ) : (
          <>
            <span className="ml-auto" />
            <NavLink href="/sign-in" testId="nav-sign-in">Sign in</NavLink>
            <NavLink href="/sign-up" testId="nav-sign-up">Sign up</NavLink>
          </>
        )}
      </nav>
    </header>
  );
}

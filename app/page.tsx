import Link from 'next/link';
import { currentUser } from '@/app/lib/server/currentUser';

export default async function HomePage() {
  const user = await currentUser().catch(() => null);
  return (
    <div>
      <h1 className="text-3xl font-bold tracking-tight" data-testid="page-title">
        Configuration interaction, in your browser
      </h1>
      <p className="mt-3 max-w-2xl text-lg text-ink-soft">
        Ketbook sets up and runs configuration-interaction calculations — CISD, CASCI, full CI — on small molecules and model
        Hamiltonians, right in the browser. Research groups keep their runs and scans together in a shared workspace, with owners,
        editors and viewers.
      </p>
      <div className="mt-6 rounded-lg border-l-4 border-caution-500 bg-caution-50 p-4 text-caution-700" data-testid="caution">
        <p className="font-semibold">Read the numbers for what they are.</p>
        <p>
          Minimal-basis (STO-3G) results are qualitative: exact within the basis, far from the complete-basis limit. They show
          trends — how correlation changes along a bond, how methods compare — not values to quote against experiment.
        </p>
      </div>
      <div className="mt-8 flex gap-3">
        {user ? (
          <Link href="/workspaces" className="rounded-md bg-ket-600 px-4 py-2 font-semibold text-white hover:bg-ket-700" data-testid="home-workspaces">
            Go to your workspaces
          </Link>
        ) : (
          <>
            <Link href="/sign-up" className="rounded-md bg-ket-600 px-4 py-2 font-semibold text-white hover:bg-ket-700" data-testid="home-sign-up">
              Create an account
            </Link>
            <Link href="/sign-in" className="rounded-md border border-ket-500 px-4 py-2 font-semibold text-ket-700 hover:bg-ket-50" data-testid="home-sign-in">
              Sign in
            </Link>
          </>
        )}
      </div>
    </div>
  );
}

import Link from 'next/link';
import { ComingWithSolver, PageTitle } from '@/components/layout/Page';
import { requirePageUser } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Runs and scans' };

export default async function RunsPage() {
  await requirePageUser('/runs');
  return (
    <div>
      <PageTitle subtitle="A run is one calculation; a scan is a series of runs along a coordinate.">Runs and scans</PageTitle>
      <p className="mb-4">
        <Link href="/runs/new" className="rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white hover:bg-ket-700" data-testid="runs-new-link">
          Start a run in this browser
        </Link>
      </p>
      <ComingWithSolver what="saved runs or scans" />
    </div>
  );
}

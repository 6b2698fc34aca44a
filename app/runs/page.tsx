import { ComingWithSolver, PageTitle } from '@/components/layout/Page';
import { requirePageUser } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Runs and scans' };

export default async function RunsPage() {
  await requirePageUser('/runs');
  return (
    <div>
      <PageTitle subtitle="A run is one calculation; a scan is a series of runs along a coordinate.">Runs and scans</PageTitle>
      <ComingWithSolver what="runs or scans" />
    </div>
  );
}

import { PageTitle } from '@/components/layout/Page';
import { RunPage } from '@/components/run/RunPage';

export const metadata = { title: 'New run' };

/** Open to everyone: the run is computed in the visitor's own browser and kept nowhere. */
export default function NewRunPage() {
  return (
    <div>
      <PageTitle subtitle="Set up a calculation and run it here, in this browser tab. Nothing is sent to the server.">New run</PageTitle>
      <RunPage />
    </div>
  );
}

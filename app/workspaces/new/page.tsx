import { NarrowCard, PageTitle } from '@/components/layout/Page';
import { CreateWorkspaceForm } from '@/components/workspace/CreateWorkspaceForm';
import { requirePageUser } from '@/app/lib/server/pageUser';

export const metadata = { title: 'New workspace' };

export default async function NewWorkspacePage() {
  await requirePageUser('/workspaces/new');
  return (
    <NarrowCard>
      <PageTitle subtitle="You become its first owner and can invite your colleagues.">Create a workspace</PageTitle>
      <CreateWorkspaceForm />
    </NarrowCard>
  );
}

import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PageTitle, Section } from '@/components/layout/Page';
import { RunsTable } from '@/components/runs/RunsTable';
import { ScansTable } from '@/components/runs/ScansTable';
import { InvitationList } from '@/components/workspace/InvitationList';
import { InviteForm } from '@/components/workspace/InviteForm';
import { MemberList } from '@/components/workspace/MemberList';
import { ProjectsPanel } from '@/components/workspace/ProjectsPanel';
import { RenameWorkspaceForm } from '@/components/workspace/RenameWorkspaceForm';
import { accessFor, can } from '@/app/lib/permissions';
import { listPendingInvitations } from '@/app/lib/queries/invitations';
import { listMembers } from '@/app/lib/queries/members';
import { listProjects } from '@/app/lib/queries/projects';
import { findMembership, findWorkspaceBySlug } from '@/app/lib/queries/workspaces';
import { requirePageUser } from '@/app/lib/server/pageUser';

type Props = { params: Promise<{ slug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  const workspace = await findWorkspaceBySlug({ slug }).catch(() => null);
  return { title: workspace?.name ?? 'Workspace' };
}

/** The workspace page, titled with the group's name. What is shown and editable follows the permission table. */
export default async function WorkspacePage({ params }: Props) {
  const { slug } = await params;
  const user = await requirePageUser(`/workspaces/${slug}`);
  const workspace = await findWorkspaceBySlug({ slug });
  if (!workspace) notFound();
  const membership = await findMembership({ workspaceId: workspace.id, userId: user.id });
  const access = accessFor(membership?.role, user.siteRole);
  if (!access) notFound();

  const [members, projects, invitations] = await Promise.all([
    listMembers({ workspaceId: workspace.id }),
    listProjects({ workspaceId: workspace.id }),
    can(access, 'invitation.list') ? listPendingInvitations({ workspaceId: workspace.id }) : Promise.resolve([]),
  ]);

  return (
    <div>
      <PageTitle subtitle={workspace.description || undefined}>{workspace.name}</PageTitle>
      <p className="-mt-4 mb-6 text-sm text-ink-soft" data-testid="workspace-access">
        Your access: {access === 'observer' ? 'site admin, read only' : access}
      </p>

      <Section title="Runs" testId="workspace-runs">
        <RunsTable slug={slug} />
      </Section>

      <Section title="Scans" testId="workspace-scans">
        <ScansTable slug={slug} />
      </Section>

      <Section title="Projects" testId="workspace-projects">
        <ProjectsPanel slug={slug} projects={projects.map(({ id, name, description }) => ({ id, name, description }))} canEdit={can(access, 'project.create')} />
      </Section>

      <Section title="Members" testId="workspace-members">
        <MemberList slug={slug} members={members} canManage={can(access, 'member.change-role')} currentUserId={user.id} />
      </Section>

      {can(access, 'invitation.list') ? (
        <Section title="Invitations" testId="workspace-invitations">
          <InvitationList slug={slug} invitations={invitations} canRevoke={can(access, 'invitation.revoke')} />
          {can(access, 'member.invite') ? (
            <div className="mt-4">
              <InviteForm slug={slug} />
            </div>
          ) : null}
        </Section>
      ) : null}

      {can(access, 'workspace.rename') ? (
        <Section title="Workspace settings" testId="workspace-settings">
          <RenameWorkspaceForm slug={slug} name={workspace.name} description={workspace.description} />
        </Section>
      ) : null}
    </div>
  );
}

import { invitationMail } from '@/app/lib/mailTemplates';
import { recordAudit } from '@/app/lib/queries/audit';
import { createInvitation, listPendingInvitations } from '@/app/lib/queries/invitations';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { sendMail } from '@/app/lib/server/mail';
import { clientAddressOf, publicLink } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';
import { createInvitationSchema } from './schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string }> };

export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'invitation.list' });
  return json({ invitations: await listPendingInvitations({ workspaceId: workspace.id }) });
});

export const POST = apiRoute<Ctx>(async (request, { params }) => {
  const { slug } = await params;
  const input = parseWithSchema(createInvitationSchema, await readJsonBody(request));
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'member.invite' });
  const { invitation, token } = await createInvitation({
    workspaceId: workspace.id,
    email: input.email,
    role: input.role,
    invitedBy: user.id,
  });
  await recordAudit({
    actorId: user.id,
    action: 'invitation.create',
    workspaceId: workspace.id,
    targetType: 'invitation',
    targetId: invitation.id,
    clientAddress: clientAddressOf(request),
    detail: { email: invitation.email, role: invitation.role },
  });
  const mail = invitationMail({
    workspaceName: workspace.name,
    inviterName: user.displayName,
    role: invitation.role,
    link: publicLink(`/invitations/accept?token=${encodeURIComponent(token)}`),
    expiresAt: new Date(invitation.expiresAt),
  });
  let mailSent = true;
  try {
    await sendMail({ to: invitation.email, subject: mail.subject, text: mail.text });
  } catch (error) {
    // The invitation exists either way; the owner sees that the mail did not go out and can revoke and retry.
    console.error('[invitations] mail failed', error);
    mailSent = false;
  }
  return json({ invitation, mailSent }, 201);
});

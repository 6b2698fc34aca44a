/** Plain-text bodies of Ketbook's e-mails. Links stand on their own line so any reader can follow them. */

export function invitationMail({
  workspaceName,
  inviterName,
  role,
  link,
  expiresAt,
}: {
  workspaceName: string;
  inviterName: string;
  role: string;
  link: string;
  expiresAt: Date;
}): { subject: string; text: string } {
  return {
    subject: `You are invited to ${workspaceName} on Ketbook`,
    text: [
      `${inviterName} invited you to join the workspace "${workspaceName}" on Ketbook as ${role}.`,
      '',
      'Open this link to accept (sign up first with this e-mail address if you have no account):',
      link,
      '',
      `The invitation expires on ${expiresAt.toISOString().slice(0, 16).replace('T', ' ')} UTC and works once.`,
      'If you did not expect it, you can ignore this message.',
    ].join('\n'),
  };
}

export function passwordResetMail({ displayName, link }: { displayName: string; link: string }): {
  subject: string;
  text: string;
} {
  return {
    subject: 'Reset your Ketbook password',
    text: [
      `Hello ${displayName},`,
      '',
      'Someone asked to reset the password of your Ketbook account. To choose a new one, open:',
      link,
      '',
      'The link works once and expires in one hour. If you did not ask for this, ignore this message;',
      'your password stays as it is.',
    ].join('\n'),
  };
}

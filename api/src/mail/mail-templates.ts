import type { NewOutboxMessage } from './outbox-repository';

function escapeHtml(text: string): string {
  return text
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&#39;');
}

function page(paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n');
  const href = escapeHtml(link.href);
  return `<!doctype html><html><body style="font-family:sans-serif">
${body}
<p><a href="${href}">${escapeHtml(link.label)}</a></p>
<p style="color:#666">If the link does not work, paste this address into your browser:<br>
${href}</p>
</body></html>`;
}

export function invitationMail(input: {
  invitationId: string;
  to: string;
  appUrl: string;
  token: string;
  workspaceName: string;
  inviterName: string;
  role: string;
  expiresAt: Date;
}): NewOutboxMessage {
  const link = `${input.appUrl}/invitations/${encodeURIComponent(input.token)}`;
  const lines = [
    `${input.inviterName} invites you to the Couplet workspace "${input.workspaceName}" ` +
      `as ${input.role}.`,
    `The invitation is valid until ${input.expiresAt.toISOString().slice(0, 16)} UTC.`,
  ];
  return {
    idempotencyKey: `invitation:${input.invitationId}`,
    toAddress: input.to,
    subject: `Join "${input.workspaceName}" on Couplet`,
    textBody: `${lines.join('\n')}\n\nOpen the invitation: ${link}\n`,
    htmlBody: page(lines, { href: link, label: 'Open the invitation' }),
  };
}

export function passwordResetMail(input: {
  resetId: string;
  to: string;
  appUrl: string;
  token: string;
}): NewOutboxMessage {
  const link = `${input.appUrl}/reset-password?token=${encodeURIComponent(input.token)}`;
  const lines = [
    'Someone asked to reset the password of your Couplet account.',
    'The link works once, for one hour. If it was not you, ignore this mail.',
  ];
  return {
    idempotencyKey: `password-reset:${input.resetId}`,
    toAddress: input.to,
    subject: 'Reset your Couplet password',
    textBody: `${lines.join('\n')}\n\nChoose a new password: ${link}\n`,
    htmlBody: page(lines, { href: link, label: 'Choose a new password' }),
  };
}

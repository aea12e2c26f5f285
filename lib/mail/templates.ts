/** E-mail texts. Plain text first; the HTML part says the same. */
import { ROLE_LABELS, type Role } from '@/lib/auth/roles';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function invitationMail(input: { name: string; workspaceName: string; inviterName: string; roles: Role[]; link: string; expiresAt: Date }) {
  const roles = input.roles.map((r) => ROLE_LABELS[r]).join(', ');
  const until = `${input.expiresAt.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
  const subject = `You are invited to ${input.workspaceName} on Probity`;
  const text = [
    `Hello ${input.name},`,
    '',
    `${input.inviterName} invites you to the ${input.workspaceName} workspace on Probity as: ${roles}.`,
    '',
    'Set your password with this link (it works once, until ' + until + '):',
    input.link,
    '',
    'If you did not expect this, ignore this message.',
  ].join('\n');
  const html = `<p>Hello ${esc(input.name)},</p><p>${esc(input.inviterName)} invites you to the <b>${esc(input.workspaceName)}</b> workspace on Probity as: ${esc(roles)}.</p><p><a href="${esc(input.link)}">Set your password</a> (the link works once, until ${esc(until)}).</p><p>If you did not expect this, ignore this message.</p>`;
  return { subject, text, html };
}

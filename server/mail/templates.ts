/** The words of the mail we send: plain text first, a light HTML twin. */
const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

function html(paragraphs: string[], link: string, button: string): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('');
  return `<div style="font-family:system-ui,sans-serif;color:#123f45">${body}<p><a href="${escapeHtml(link)}" style="background:#1d7a74;color:#fff;padding:8px 14px;border-radius:6px;text-decoration:none">${escapeHtml(button)}</a></p><p style="color:#5b6a6c">${escapeHtml(link)}</p></div>`;
}

export function invitationMail(p: { teamName: string; inviterName: string; role: string; link: string }) {
  const lines = [
    `${p.inviterName} has invited you to join ${p.teamName} on Lobewise as ${p.role}.`,
    'Open the link below to choose your name and password. It works once and expires in 7 days.',
  ];
  return {
    subject: `You are invited to ${p.teamName} on Lobewise`,
    text: `${lines.join('\n\n')}\n\n${p.link}\n`,
    html: html(lines, p.link, 'Accept the invitation'),
  };
}

export function passwordResetMail(p: { name: string; link: string }) {
  const lines = [
    `Hello ${p.name},`,
    'Someone (hopefully you) asked to reset your Lobewise password. The link below works once and expires in 1 hour.',
    'If you did not ask, ignore this message; your password stays as it is.',
  ];
  return {
    subject: 'Reset your Lobewise password',
    text: `${lines.join('\n\n')}\n\n${p.link}\n`,
    html: html(lines, p.link, 'Choose a new password'),
  };
}

import { escapeHtml, type ComposedMail } from '@/lib/review/mail';

/**
 * The reset e-mail: who asked, the one-time link, how long it works. It carries no figures, so no caution
 * line; it never carries a password.
 */
export function composeResetMail(p: { userName: string; adminName: string; organisationName: string; url: string; hours: number }): ComposedMail {
  const subject = 'Set a new Arcline password';
  const lead = `${p.adminName}, an admin of ${p.organisationName}, has asked Arcline to let you set a new password.`;
  const how = `The link works once, for ${p.hours} hours. Your current password keeps working until you set a new one, and setting one signs you out everywhere.`;
  const ignore = 'If you did not expect this, ignore this e-mail and tell your admin.';
  const text = [`Hello ${p.userName},`, lead, `Set a new password: ${p.url}`, how, ignore].join('\n\n');
  const html = [
    '<!doctype html><html><body style="font-family:sans-serif;line-height:1.4">',
    `<p>Hello ${escapeHtml(p.userName)},</p>`,
    `<p>${escapeHtml(lead)}</p>`,
    `<p><a href="${escapeHtml(p.url)}">Set a new password</a></p>`,
    `<p>${escapeHtml(how)}</p>`,
    `<p style="color:#555">${escapeHtml(ignore)}</p>`,
    '</body></html>',
  ].join('');
  return { subject, text, html };
}

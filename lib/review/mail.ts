import { CAUTION_TEXT } from '@/lib/caution';

/**
 * Review-desk e-mails: a plain-text and an HTML body, a link to the scene and the caution line. Everything
 * a person typed (titles, names, comments) is escaped in the HTML body.
 */
export interface ComposedMail {
  subject: string;
  text: string;
  html: string;
}

export function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

export interface MailParts {
  subject: string;
  /** Opening sentence. */
  lead: string;
  /** Quoted text a person wrote (a note, conditions, a comment), shown as typed. */
  quotes?: { label: string; text: string }[];
  figures?: string[];
  link: { label: string; url: string };
}

export function composeMail(p: MailParts): ComposedMail {
  const quotes = (p.quotes ?? []).filter((q) => q.text.trim() !== '');
  const text = [
    p.lead,
    ...quotes.map((q) => `${q.label}:\n${q.text.split('\n').map((l) => `> ${l}`).join('\n')}`),
    ...(p.figures?.length ? [['Figures computed by the server:', ...p.figures.map((f) => `- ${f}`)].join('\n')] : []),
    `${p.link.label}: ${p.link.url}`,
    CAUTION_TEXT,
  ].join('\n\n');
  const html = [
    '<!doctype html><html><body style="font-family:sans-serif;line-height:1.4">',
    `<p>${escapeHtml(p.lead)}</p>`,
    ...quotes.map((q) => `<p><strong>${escapeHtml(q.label)}:</strong></p><blockquote style="white-space:pre-wrap;border-left:3px solid #999;margin:0;padding-left:8px">${escapeHtml(q.text)}</blockquote>`),
    ...(p.figures?.length ? [`<p>Figures computed by the server:</p><ul>${p.figures.map((f) => `<li>${escapeHtml(f)}</li>`).join('')}</ul>`] : []),
    `<p><a href="${escapeHtml(p.link.url)}">${escapeHtml(p.link.label)}</a></p>`,
    `<p style="color:#555;font-size:12px">${escapeHtml(CAUTION_TEXT)}</p>`,
    '</body></html>',
  ].join('');
  return { subject: p.subject, text, html };
}

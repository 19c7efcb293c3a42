/**
 * One look for every e-mail: plain text plus a small HTML page in our palette (PRODUCT.md: slate
 * primary, crust amber accent, cream paper). Inline styles and no images, because mail clients
 * drop <style> blocks and block remote images; a message must read well with both missing.
 */
export interface MailContent {
  /** The first line, also used as the HTML title. */
  heading: string;
  /** Plain sentences; escaped for HTML, never interpreted as markup. */
  paragraphs: string[];
  /** A button in HTML, a bare URL in text. `path` is relative to the app, e.g. `/reset-password?token=…`. */
  action?: { label: string; path: string };
  /** Small print under the button (e.g. why the reader got this, how long a link works). */
  note?: string;
  /** Footer link to the alert settings page; on by default, off for account mail like password resets. */
  alertSettingsLink?: boolean;
}

export interface RenderedMail {
  text: string;
  html: string;
}

const SLATE = '#2F4858';
const CREAM = '#FBF7F0';
const INK = '#1F2A30';
const MUTED = '#5B6770';
const AMBER = '#C9832E';

export const ALERT_SETTINGS_PATH = '/account/alerts';

export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** `publicUrl` has no trailing slash (config.ts trims it); `path` starts with a slash. */
export function absoluteUrl(publicUrl: string, path: string): string {
  return `${publicUrl}${path.startsWith('/') ? path : `/${path}`}`;
}

export function renderMail(content: MailContent, publicUrl: string): RenderedMail {
  const actionUrl = content.action ? absoluteUrl(publicUrl, content.action.path) : null;
  const settingsUrl = content.alertSettingsLink === false ? null : absoluteUrl(publicUrl, ALERT_SETTINGS_PATH);
  return { text: renderText(content, actionUrl, settingsUrl), html: renderHtml(content, actionUrl, settingsUrl) };
}

function renderText(content: MailContent, actionUrl: string | null, settingsUrl: string | null): string {
  const lines = [content.heading, '', ...content.paragraphs.flatMap((p) => [p, ''])];
  if (content.action && actionUrl) lines.push(`${content.action.label}: ${actionUrl}`, '');
  if (content.note) lines.push(content.note, '');
  lines.push('-- ', 'Peakwise, your sourdough logbook');
  if (settingsUrl) lines.push(`Alert settings: ${settingsUrl}`);
  return lines.join('\n') + '\n';
}

function renderHtml(content: MailContent, actionUrl: string | null, settingsUrl: string | null): string {
  const font = 'font-family:Roboto,Helvetica,Arial,sans-serif';
  const paragraphs = content.paragraphs
    .map((p) => `<p style="margin:0 0 16px;${font};font-size:16px;line-height:24px;color:${INK}">${escapeHtml(p)}</p>`)
    .join('\n');
  const button =
    content.action && actionUrl
      ? `<p style="margin:24px 0"><a href="${escapeHtml(actionUrl)}" style="display:inline-block;background:${SLATE};color:#FFFFFF;${font};font-size:16px;font-weight:500;text-decoration:none;padding:12px 20px;border-radius:8px">${escapeHtml(content.action.label)}</a></p>
<p style="margin:0 0 16px;${font};font-size:13px;line-height:20px;color:${MUTED}">If the button does not work, copy this address into your browser:<br><span style="word-break:break-all">${escapeHtml(actionUrl)}</span></p>`
      : '';
  const note = content.note
    ? `<p style="margin:0 0 16px;${font};font-size:14px;line-height:20px;color:${MUTED}">${escapeHtml(content.note)}</p>`
    : '';
  const settings = settingsUrl
    ? ` · <a href="${escapeHtml(settingsUrl)}" style="color:${SLATE}">Alert settings</a>`
    : '';
  return `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(content.heading)}</title></head>
<body style="margin:0;padding:0;background:${CREAM}">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background:${CREAM}"><tr><td align="center" style="padding:24px 12px">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="max-width:560px;background:#FFFFFF;border-radius:12px;border-top:4px solid ${AMBER}">
<tr><td style="padding:24px">
<p style="margin:0 0 8px;${font};font-size:14px;font-weight:500;letter-spacing:0.04em;color:${SLATE}">PEAKWISE</p>
<h1 style="margin:0 0 16px;${font};font-size:22px;line-height:28px;font-weight:500;color:${INK}">${escapeHtml(content.heading)}</h1>
${paragraphs}
${button}
${note}
</td></tr>
</table>
<p style="margin:16px 0 0;${font};font-size:12px;line-height:18px;color:${MUTED}">Peakwise, your sourdough logbook${settings}</p>
</td></tr></table>
</body>
</html>
`;
}

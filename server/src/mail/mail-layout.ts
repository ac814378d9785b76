/** A piece of an e-mail, written once and rendered to both the text and the HTML part. */
export type MailBlock =
  | { type: 'heading'; text: string }
  | { type: 'paragraph'; text: string }
  | { type: 'link'; label: string; url: string }
  | { type: 'list'; items: string[] }
  | { type: 'facts'; rows: [label: string, value: string][] };

/** Both parts of a message. */
export interface RenderedMail {
  text: string;
  html: string;
}

/** Escapes text for HTML content and attribute values. */
export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

function assertWebUrl(url: string): string {
  const parsed = new URL(url);
  if (parsed.protocol !== 'http:' && parsed.protocol !== 'https:') throw new Error(`Not a web link: ${url}`);
  return parsed.toString();
}

function textBlock(block: MailBlock): string {
  switch (block.type) {
    case 'heading':
      return `${block.text}\n${'-'.repeat(Math.min(block.text.length, 60))}`;
    case 'paragraph':
      return block.text;
    case 'link':
      return `${block.label}:\n${assertWebUrl(block.url)}`;
    case 'list':
      return block.items.map((item) => `- ${item}`).join('\n');
    case 'facts': {
      const width = Math.max(...block.rows.map(([label]) => label.length));
      return block.rows.map(([label, value]) => `${`${label}:`.padEnd(width + 2)}${value}`).join('\n');
    }
  }
}

const ink = 'color:#1f2a2e';

function htmlBlock(block: MailBlock): string {
  switch (block.type) {
    case 'heading':
      return `<h2 style="font-size:17px;margin:24px 0 8px;${ink}">${escapeHtml(block.text)}</h2>`;
    case 'paragraph':
      return `<p style="margin:0 0 12px;line-height:1.5;${ink}">${escapeHtml(block.text)}</p>`;
    case 'link': {
      const url = escapeHtml(assertWebUrl(block.url));
      return `<p style="margin:0 0 12px"><a href="${url}" style="color:#2f5d50;font-weight:600">${escapeHtml(block.label)}</a><br><span style="font-size:12px;color:#5a6b70;word-break:break-all">${url}</span></p>`;
    }
    case 'list':
      return `<ul style="margin:0 0 12px;padding-left:20px;${ink}">${block.items.map((item) => `<li style="margin:0 0 4px">${escapeHtml(item)}</li>`).join('')}</ul>`;
    case 'facts':
      return `<table role="presentation" style="border-collapse:collapse;margin:0 0 12px;${ink}">${block.rows
        .map(
          ([label, value]) =>
            `<tr><th scope="row" style="text-align:left;padding:2px 16px 2px 0;font-weight:600;vertical-align:top">${escapeHtml(label)}</th><td style="padding:2px 0">${escapeHtml(value)}</td></tr>`,
        )
        .join('')}</table>`;
  }
}

/**
 * Renders a message's blocks as a plain-text part and an HTML part with the same words. The HTML loads
 * nothing from anywhere (no images, fonts or scripts), so opening it tells no one anything: no tracking.
 *
 * @example renderMail('Invite', [{ type: 'paragraph', text: 'Hello' }]).text // 'Hello\n\n-- \n…'
 */
export function renderMail(title: string, blocks: MailBlock[], footer: string): RenderedMail {
  const text = `${blocks.map(textBlock).join('\n\n')}\n\n-- \n${footer}\n`;
  const html = [
    '<!doctype html>',
    `<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(title)}</title></head>`,
    '<body style="margin:0;padding:24px;background:#f4f1ea;font-family:Lexend,Arial,sans-serif;font-size:15px">',
    '<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px">',
    ...blocks.map(htmlBlock),
    `<p style="margin:24px 0 0;font-size:12px;color:#5a6b70">${escapeHtml(footer)}</p>`,
    '</div></body></html>',
  ].join('');
  return { text, html };
}

import type { StoredEmail } from './store';

/** Escape text for HTML. */
export function esc(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

const STYLE = `body{font-family:system-ui,sans-serif;margin:0;color:#14212b;background:#f7f3ea}
header{background:#14212b;color:#f7f3ea;padding:.75rem 1rem}main{padding:1rem;max-width:48rem;margin:auto}
a{color:#0b6e74}ul{list-style:none;padding:0}li{border-bottom:1px solid #d9d2c3;padding:.6rem 0}
.meta{color:#55606a;font-size:.9rem}iframe{width:100%;min-height:24rem;border:1px solid #d9d2c3;background:#fff}
pre{white-space:pre-wrap;background:#fff;border:1px solid #d9d2c3;padding:.75rem}
.links a{display:inline-block;padding:.6rem 0;word-break:break-all}`;

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${esc(title)}</title><style>${STYLE}</style></head><body><header><strong>Fake mail service</strong> · local inbox, nothing leaves this machine</header><main>${body}</main></body></html>`;
}

/** Every link in a message's HTML and text, in order, without repeats. */
export function linksIn(e: StoredEmail): string[] {
  const found = new Set<string>();
  for (const m of (e.html ?? '').matchAll(/href\s*=\s*"([^"]+)"/gi)) found.add(unescapeAttr(m[1]));
  for (const m of (e.text ?? '').matchAll(/https?:\/\/[^\s<>"]+/g)) found.add(m[0]);
  return [...found].filter((l) => /^https?:\/\//.test(l));
}

function unescapeAttr(value: string): string {
  const named: Record<string, string> = { amp: '&', quot: '"', lt: '<', gt: '>', apos: "'" };
  return value.replace(/&(#x[0-9a-f]+|#\d+|amp|quot|lt|gt|apos);/gi, (_m, code: string) => {
    if (code[0] !== '#') return named[code.toLowerCase()];
    const n = code[1].toLowerCase() === 'x' ? Number.parseInt(code.slice(2), 16) : Number(code.slice(1));
    return String.fromCodePoint(n);
  });
}

/** The inbox: newest first, filterable by recipient. */
export function inboxPage(emails: StoredEmail[], to: string): string {
  const items = emails
    .map(
      (e) => `<li><a href="/m/${esc(e.id)}"><strong>${esc(e.subject)}</strong></a>
<div class="meta">to ${esc(e.to.join(', '))} · from ${esc(e.from)} · ${esc(e.createdAt)}${e.attachments.length ? ` · ${e.attachments.length} attachment(s)` : ''}</div></li>`,
    )
    .join('');
  const form = `<form method="get" action="/"><label>Recipient contains <input name="to" value="${esc(to)}" inputmode="email"></label> <button>Filter</button></form>`;
  return page('Inbox', `<h1>Inbox (${emails.length})</h1>${form}<ul>${items || '<li>No messages yet.</li>'}</ul>`);
}

/** One message: headers, its links as plain anchors, the HTML body in a sandboxed frame, the text. */
export function messagePage(e: StoredEmail): string {
  const links = linksIn(e)
    .map((l) => `<li><a class="message-link" href="${esc(l)}">${esc(l)}</a></li>`)
    .join('');
  const files = e.attachments
    .map((a) => `<li><a href="/emails/${esc(e.id)}/attachments/${esc(a.id)}/raw">${esc(a.filename)}</a> <span class="meta">${esc(a.contentType)}, ${a.size} bytes</span></li>`)
    .join('');
  const html = e.html
    ? `<h2>HTML</h2><iframe sandbox="allow-popups allow-top-navigation-by-user-activation" title="Message body" srcdoc="${esc(`<base target="_top">${e.html}`)}"></iframe>`
    : '';
  const text = e.text ? `<h2>Text</h2><pre>${esc(e.text)}</pre>` : '';
  return page(
    e.subject,
    `<p><a href="/">← Inbox</a></p><h1>${esc(e.subject)}</h1>
<p class="meta">From ${esc(e.from)}<br>To ${esc(e.to.join(', '))}<br>${esc(e.createdAt)}</p>
${links ? `<h2>Links</h2><ul class="links">${links}</ul>` : ''}${files ? `<h2>Attachments</h2><ul>${files}</ul>` : ''}${html}${text}`,
  );
}

export function notFoundPage(): string {
  return page('Not found', '<h1>No such message</h1><p><a href="/">Back to the inbox</a></p>');
}

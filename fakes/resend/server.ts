/**
 * Local stand-in for the hosted e-mail service: the part of its HTTP API the resend SDK calls
 * (send, read back, list, attachments), messages kept durably under FAKE_RESEND_DIR, and an inbox
 * page at / where developers and tests open messages and click their links.
 */
import { Buffer } from 'node:buffer';
import http from 'node:http';
import path from 'node:path';
import { attachmentResource, emailResource, parseSend } from './api';
import type { ApiError } from './api';
import { inboxPage, messagePage, notFoundPage } from './inbox';
import { EmailStore } from './store';
import { whenParentExits } from '../../src/lib/commands/parent-watch';

const port = Number(process.env.PORT) || 4610;
const host = process.env.HOST || '127.0.0.1';
const store = new EmailStore(process.env.FAKE_RESEND_DIR || path.resolve('data', 'fake-resend'));
const MAX_BODY = 45 * 1024 * 1024;

type Reply = { status: number; json?: unknown; html?: string; bytes?: Buffer; type?: string };

function error(e: ApiError): Reply {
  return { status: e.statusCode, json: e };
}

async function readJson(req: http.IncomingMessage): Promise<unknown> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > MAX_BODY) throw new Error('too large');
    chunks.push(chunk as Buffer);
  }
  return JSON.parse(Buffer.concat(chunks).toString('utf8') || 'null');
}

function authorised(req: http.IncomingMessage): boolean {
  return /^Bearer \S+/.test(req.headers.authorization ?? '');
}

async function handleApi(req: http.IncomingMessage, url: URL): Promise<Reply | null> {
  const parts = url.pathname.split('/').filter(Boolean);
  if (parts[0] !== 'emails') return null;
  const raw = parts.length === 5 && parts[2] === 'attachments' && parts[4] === 'raw';
  if (!raw && !authorised(req)) {
    return error({
      statusCode: 401,
      name: 'missing_api_key',
      message: 'Missing API key in the authorization header.',
    });
  }
  if (req.method === 'POST' && parts.length === 1) {
    let body: unknown;
    try {
      body = await readJson(req);
    } catch {
      return error({
        statusCode: 400,
        name: 'invalid_body',
        message: 'The body is not valid JSON.',
      });
    }
    const parsed = parseSend(body);
    if ('statusCode' in parsed) return error(parsed);
    const saved = store.save(parsed);
    console.log(`fake-resend: "${saved.subject}" to ${saved.to.join(', ')}`);
    return { status: 200, json: { id: saved.id } };
  }
  if (req.method !== 'GET')
    return error({ statusCode: 405, name: 'method_not_allowed', message: 'Method not allowed.' });
  if (parts.length === 1) {
    const data = store.list(url.searchParams.get('to') ?? undefined).map(emailResource);
    const limit = Math.min(Number(url.searchParams.get('limit')) || 100, 100);
    return {
      status: 200,
      json: { object: 'list', has_more: data.length > limit, data: data.slice(0, limit) },
    };
  }
  const email = store.get(parts[1]);
  const missing = error({ statusCode: 404, name: 'not_found', message: 'Email not found.' });
  if (!email) return missing;
  if (parts.length === 2) return { status: 200, json: emailResource(email) };
  if (parts[2] !== 'attachments') return missing;
  const base = `http://${req.headers.host}`;
  if (parts.length === 3) {
    return {
      status: 200,
      json: {
        object: 'list',
        has_more: false,
        data: email.attachments.map((a) => attachmentResource(email.id, a, base)),
      },
    };
  }
  const file = email.attachments.find((a) => a.id === parts[3]);
  if (!file) return missing;
  if (raw)
    return { status: 200, bytes: Buffer.from(file.content, 'base64'), type: file.contentType };
  return { status: 200, json: attachmentResource(email.id, file, base) };
}

function handlePages(url: URL): Reply {
  if (url.pathname === '/health')
    return { status: 200, json: { ok: true, service: 'fake-resend' } };
  if (url.pathname === '/') {
    const to = url.searchParams.get('to') ?? '';
    return { status: 200, html: inboxPage(store.list(to || undefined), to) };
  }
  const m = /^\/m\/([\w-]+)$/.exec(url.pathname);
  const email = m ? store.get(m[1]) : null;
  return email ? { status: 200, html: messagePage(email) } : { status: 404, html: notFoundPage() };
}

function send(res: http.ServerResponse, reply: Reply): void {
  res.setHeader('X-Content-Type-Options', 'nosniff');
  if (reply.bytes) {
    res.writeHead(reply.status, { 'Content-Type': reply.type ?? 'application/octet-stream' });
    res.end(reply.bytes);
  } else if (reply.html !== undefined) {
    res.writeHead(reply.status, { 'Content-Type': 'text/html; charset=utf-8' });
    res.end(reply.html);
  } else {
    res.writeHead(reply.status, { 'Content-Type': 'application/json' });
    res.end(JSON.stringify(reply.json));
  }
}

const server = http.createServer((req, res) => {
  const url = new URL(req.url ?? '/', 'http://fake.local');
  handleApi(req, url)
    .then((reply) => send(res, reply ?? handlePages(url)))
    .catch(() =>
      send(res, {
        status: 500,
        json: { statusCode: 500, name: 'internal_server_error', message: 'Fake failed.' },
      }),
    );
});

server.listen(port, host, () => console.log(`fake-resend listening on http://${host}:${port}`));
for (const signal of ['SIGTERM', 'SIGINT'] as const) process.on(signal, () => process.exit(0));
whenParentExits(() => process.exit(0));

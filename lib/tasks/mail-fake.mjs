// A local fake SMTP server for development and tests (loopback only): accepts every
// message, keeps the last 500 in memory and shows them on a small web page.
//   node lib/tasks/mail-fake.mjs --smtp 2525 --http 2580
//   GET /            the mailbox as a page
//   GET /messages    the messages as JSON (newest first; ?to=address filters)
//   DELETE /messages empties the mailbox
import { createServer } from 'node:http';
import console from 'node:console';
import process from 'node:process';
import { setTimeout } from 'node:timers';
import { URL } from 'node:url';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

function arg(name, fallback) {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 && process.argv[i + 1] ? Number(process.argv[i + 1]) : fallback;
}

const SMTP_PORT = arg('smtp', 2525);
const HTTP_PORT = arg('http', 2580);
const HOST = '127.0.0.1';
const LIMIT = 500;
/** @type {{ id: number, receivedAt: string, from: string, to: string[], subject: string, text: string, html: string | null }[]} */
let messages = [];
let nextId = 1;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  banner: 'Probity fake SMTP (nothing leaves this machine)',
  size: 5 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const to = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
        messages.unshift({
          id: nextId++,
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to,
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          html: typeof mail.html === 'string' ? mail.html : null,
        });
        messages = messages.slice(0, LIMIT);
        console.log(`[mail-fake] message for ${to.join(', ')}: ${mail.subject ?? ''}`);
        callback();
      })
      .catch((error) => callback(error));
  },
});

const escape = (s) => String(s).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function page() {
  const rows = messages.map((m) => `<article><h2>${escape(m.subject)}</h2><p class="meta">#${m.id} · ${escape(m.receivedAt)} · to ${escape(m.to.join(', '))}</p><pre>${escape(m.text)}</pre></article>`).join('');
  return `<!doctype html><meta charset="utf-8"><title>Probity mailbox</title>
<style>body{font:15px system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem;color:#1a201b}article{border:1px solid #d6dad2;border-radius:8px;padding:0 1rem;margin:1rem 0}.meta{color:#535c51;font-size:13px}pre{white-space:pre-wrap}</style>
<h1>Probity mailbox (fake SMTP, development and tests only)</h1><p>${messages.length} message(s). Nothing here was sent anywhere.</p>${rows}`;
}

const http = createServer((req, res) => {
  const url = new URL(req.url ?? '/', `http://${HOST}`);
  if (url.pathname === '/messages' && req.method === 'DELETE') {
    messages = [];
    res.writeHead(204).end();
  } else if (url.pathname === '/messages') {
    const to = url.searchParams.get('to')?.toLowerCase();
    const list = to ? messages.filter((m) => m.to.includes(to)) : messages;
    res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify(list));
  } else if (url.pathname === '/') {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' }).end(page());
  } else {
    res.writeHead(404, { 'content-type': 'text/plain' }).end('not found');
  }
});

smtp.on('error', (error) => console.error('[mail-fake] smtp error:', error.message));
smtp.listen(SMTP_PORT, HOST, () => console.log(`[mail-fake] SMTP on ${HOST}:${SMTP_PORT}`));
http.listen(HTTP_PORT, HOST, () => console.log(`[mail-fake] mailbox on http://${HOST}:${HTTP_PORT}`));

function stop() {
  smtp.close(() => http.close(() => process.exit(0)));
  setTimeout(() => process.exit(0), 2000).unref();
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);

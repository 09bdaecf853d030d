// A local SMTP fake for mail: smtp-server on loopback that accepts every message and keeps it as
// JSON in a folder (the caught-mail page reads it there) and in memory (for tests). The server
// reaches it over plain SMTP, so a real mail server replaces it by settings.
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Starts the fake on 127.0.0.1:port (0 picks a free port), keeping messages under `dir`.
 * Returns { host, port, dir, messages(), waitFor(match, ms), refuseNext(n), attempts(), stop() }.
 */
export async function startSmtpFake({ dir, port = 0 }) {
  if (!dir) throw new Error('startSmtpFake needs a dir to keep the caught mail in.');
  mkdirSync(dir, { recursive: true });
  // Loaded here, not at the top: the scripts import this file before they install dependencies.
  const { SMTPServer } = await import('smtp-server');
  const caught = [];
  const waiters = new Set();
  let refuse = 0;
  let refuseMatch = null;
  let attempts = 0;
  let seq = 0;

  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Breakline local mail catcher',
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, done) {
      const parts = [];
      stream.on('data', (c) => parts.push(c));
      stream.on('end', () => {
        attempts++;
        const raw = Buffer.concat(parts).toString('utf8');
        const msg = parseMessage(raw, session.envelope);
        if (refuse > 0 && (!refuseMatch || refuseMatch(msg))) {
          refuse--;
          const err = new Error('Mailbox busy, try again later (refused on purpose by the test)');
          err.responseCode = 451;
          return done(err);
        }
        msg.id = `${Date.now()}-${String(++seq).padStart(6, '0')}`;
        msg.at = new Date().toISOString();
        writeFileSync(join(dir, `${msg.id}.json`), JSON.stringify(msg, null, 2));
        caught.push(msg);
        for (const w of waiters) w.check();
        done();
      });
    },
  });

  const actual = await new Promise((resolve, reject) => {
    server.once('error', (e) => {
      const why = e.code === 'EADDRINUSE' ? `port ${port} on 127.0.0.1 is already in use` : e.message;
      reject(new Error(`The local mail catcher (SMTP fake) could not start: ${why}. Stop what uses the port or choose another.`));
    });
    server.listen(port, '127.0.0.1', () => resolve(server.server.address().port));
  });
  server.on('error', () => { /* a client dropping its connection is not the fake's problem */ });

  /** Resolves with the first caught message (now or later) that `match` accepts. */
  const waitFor = (match, ms = 15000) => new Promise((resolve, reject) => {
    const w = {
      check() {
        const found = caught.find(match);
        if (!found) return;
        clearTimeout(w.timer);
        waiters.delete(w);
        resolve(found);
      },
      timer: setTimeout(() => {
        waiters.delete(w);
        reject(new Error(`No matching mail arrived at the SMTP fake within ${ms} ms; caught: ${JSON.stringify(caught.map((m) => ({ to: m.to, subject: m.subject })))}`));
      }, ms),
    };
    waiters.add(w);
    w.check();
  });

  return {
    host: '127.0.0.1',
    port: actual,
    dir,
    messages: () => [...caught],
    waitFor,
    /** The next n messages (that `match` accepts, if given) are refused with a temporary error (451), as a busy server would. */
    refuseNext: (n, match = null) => { refuse = n; refuseMatch = match; },
    /** Messages offered so far, refused ones included. */
    attempts: () => attempts,
    stop: () => new Promise((resolve) => {
      for (const w of waiters) clearTimeout(w.timer);
      server.close(() => resolve());
    }),
  };
}

/** The few parts of a message a person reads: sender, recipients, subject and plain text. */
export function parseMessage(raw, envelope = { mailFrom: false, rcptTo: [] }) {
  const { headers, body } = splitHeaders(raw);
  const text = plainText(headers, body);
  return {
    from: envelope.mailFrom ? envelope.mailFrom.address : decodeWords(headers['from'] ?? ''),
    to: envelope.rcptTo.length ? envelope.rcptTo.map((r) => r.address) : decodeWords(headers['to'] ?? '').split(',').map((s) => s.trim()).filter(Boolean),
    subject: decodeWords(headers['subject'] ?? ''),
    text,
    tag: headers['x-breakline-tag'] ?? null,
  };
}

function splitHeaders(raw) {
  const cut = raw.search(/\r?\n\r?\n/);
  const head = cut < 0 ? raw : raw.slice(0, cut);
  const body = cut < 0 ? '' : raw.slice(cut).replace(/^\r?\n\r?\n/, '');
  const headers = {};
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const i = line.indexOf(':');
    if (i > 0) headers[line.slice(0, i).trim().toLowerCase()] = line.slice(i + 1).trim();
  }
  return { headers, body };
}

function plainText(headers, body) {
  const type = headers['content-type'] ?? 'text/plain';
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (/^multipart\//i.test(type) && boundary) {
    for (const part of body.split(`--${boundary}`).slice(1)) {
      if (part.startsWith('--')) break;
      const p = splitHeaders(part.replace(/^\r?\n/, ''));
      const inner = plainText(p.headers, p.body);
      if (inner) return inner;
    }
    return '';
  }
  if (!/^text\/plain/i.test(type)) return '';
  const enc = (headers['content-transfer-encoding'] ?? '7bit').toLowerCase();
  if (enc === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  if (enc === 'quoted-printable') return quotedPrintable(body);
  return body.replace(/\r\n/g, '\n').replace(/\n$/, '');
}

function quotedPrintable(s) {
  const bytes = [];
  const flat = s.replace(/=\r?\n/g, '').replace(/\r\n/g, '\n');
  for (let i = 0; i < flat.length; i++) {
    if (flat[i] === '=' && /^[0-9A-F]{2}$/i.test(flat.slice(i + 1, i + 3))) {
      bytes.push(parseInt(flat.slice(i + 1, i + 3), 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(flat[i], 'utf8'));
    }
  }
  return Buffer.from(bytes).toString('utf8').replace(/\n$/, '');
}

/** RFC 2047 encoded words (=?utf-8?Q?...?= and =?utf-8?B?...?=) back to text. */
function decodeWords(s) {
  return s
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_m, _charset, enc, data) =>
      enc.toUpperCase() === 'B'
        ? Buffer.from(data, 'base64').toString('utf8')
        : quotedPrintable(data.replace(/_/g, ' ')));
}

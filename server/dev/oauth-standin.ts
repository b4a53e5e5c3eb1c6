// A local stand-in for GitHub's OAuth web flow and the two API calls passport-github2 makes.
// Used whenever GITHUB_CLIENT_ID / GITHUB_CLIENT_SECRET are not set.
import express from 'express';
import { randomBytes } from 'node:crypto';
import type { Server } from 'node:http';
import { DEMO_ACCOUNTS, standInEmail, standInGithubId } from './demo-accounts.ts';

const HANDLE = /^[a-z0-9](?:[a-z0-9-]{0,37}[a-z0-9])?$/i;
const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function pickerPage(query: URLSearchParams, error?: string): string {
  const hidden = ['client_id', 'redirect_uri', 'state', 'scope']
    .map((k) => `<input type="hidden" name="${k}" value="${esc(query.get(k) ?? '')}">`)
    .join('');
  const buttons = DEMO_ACCOUNTS.map((a) => `<button name="login" value="${a.login}"><b>${a.login}</b><span>${a.role}</span></button>`).join(
    '',
  );
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>Local sign-in stand-in</title><style>
body{font-family:system-ui,sans-serif;background:#F6F4EF;color:#1D232B;margin:0;padding:2rem 1rem}
main{max-width:28rem;margin:auto;background:#fff;border:1px solid #d8d3c8;border-radius:10px;padding:1.5rem}
h1{font-size:1.2rem;margin:0 0 .25rem}p{color:#4a525c;font-size:.9rem}
.grid{display:grid;gap:.5rem;margin:1rem 0}
button{display:flex;justify-content:space-between;padding:.6rem .8rem;border:1px solid #c9c2b4;background:#fff;border-radius:6px;font-size:.95rem;cursor:pointer}
button:hover,button:focus{border-color:#B5532A;outline:2px solid #B5532A33}button span{color:#2F6F73}
label{display:block;font-size:.9rem;margin-top:1rem}input[type=text]{width:100%;box-sizing:border-box;padding:.5rem;border:1px solid #c9c2b4;border-radius:6px;font-size:1rem;margin:.25rem 0}
.go{background:#B5532A;color:#fff;border-color:#B5532A;justify-content:center;width:100%}.err{color:#B42318}</style></head>
<body><main><h1>Sign in (local stand-in)</h1>
<p>This development stand-in replaces GitHub. Pick a demo account or type any handle to create a new maker.</p>
${error ? `<p class="err" role="alert">${esc(error)}</p>` : ''}
<form method="get" action="/login/oauth/authorize">${hidden}<div class="grid">${buttons}</div>
<label for="handle">Another handle</label><input id="handle" type="text" name="handle" autocomplete="off" pattern="[A-Za-z0-9-]{1,39}">
<button class="go" type="submit">Continue</button></form></main></body></html>`;
}

export interface OAuthStandIn {
  url: string;
  close(): Promise<void>;
}

/** Start the stand-in on 127.0.0.1:port (0 picks a free port). */
export async function startOAuthStandIn(port: number): Promise<OAuthStandIn> {
  const app = express();
  const codes = new Map<string, string>();
  const tokens = new Map<string, string>();
  app.disable('x-powered-by');
  app.use(express.urlencoded({ extended: false }));
  app.use(express.json());

  app.get('/login/oauth/authorize', (req, res) => {
    const q = new URL(req.originalUrl, 'http://stand-in').searchParams;
    const redirect = q.get('redirect_uri');
    if (!redirect) return void res.status(400).send('redirect_uri is required');
    const login = (q.get('login') || q.get('handle') || '').trim();
    if (!login) return void res.type('html').send(pickerPage(q));
    if (!HANDLE.test(login))
      return void res.status(400).type('html').send(pickerPage(q, 'Handles use letters, digits and single hyphens (max 39).'));
    const code = randomBytes(16).toString('hex');
    codes.set(code, login.toLowerCase());
    const target = new URL(redirect);
    target.searchParams.set('code', code);
    if (q.get('state')) target.searchParams.set('state', q.get('state')!);
    res.redirect(302, target.toString());
  });

  app.get('/favicon.ico', (_req, res) => void res.status(204).end());

  app.post('/login/oauth/access_token', (req, res) => {
    const code = String(req.body?.code ?? '');
    const login = codes.get(code);
    codes.delete(code);
    if (!login) return void res.json({ error: 'bad_verification_code', error_description: 'The code is incorrect or expired.' });
    const token = randomBytes(20).toString('hex');
    tokens.set(token, login);
    res.json({ access_token: token, token_type: 'bearer', scope: 'user:email' });
  });

  const who = (auth: string | undefined) => tokens.get((auth ?? '').replace(/^(token|bearer)\s+/i, ''));

  app.get('/user', (req, res) => {
    const login = who(req.headers.authorization);
    if (!login) return void res.status(401).json({ message: 'Bad credentials' });
    const demo = DEMO_ACCOUNTS.find((a) => a.login === login);
    res.json({ id: Number(standInGithubId(login)), login, name: demo?.name ?? login, email: null, avatar_url: null, html_url: null });
  });

  app.get('/user/emails', (req, res) => {
    const login = who(req.headers.authorization);
    if (!login) return void res.status(401).json({ message: 'Bad credentials' });
    res.json([{ email: standInEmail(login), primary: true, verified: true, visibility: 'private' }]);
  });

  const server: Server = await new Promise((resolve) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
  });
  const address = server.address();
  const actual = typeof address === 'object' && address ? address.port : port;
  return {
    url: `http://127.0.0.1:${actual}`,
    close: () =>
      new Promise((r) => {
        server.closeAllConnections();
        server.close(() => r());
      }),
  };
}

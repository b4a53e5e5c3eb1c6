import passport, { type PassportStatic } from 'passport';
import { Strategy as GitHubStrategy, type Profile } from 'passport-github2';
import type { Config } from '../config.ts';
import type { Logger } from '../logger.ts';
import { AppError } from '../errors.ts';
import { findActiveUser, signInFromGithub } from '../services/user.service.ts';
import { welcomeMail } from '../services/mail.service.ts';
import { APP_URL, enqueueMail, kickOutbox } from '../services/outbox.service.ts';

/** passport-github2 that also forwards GitHub's own `login` hint to the authorize page. */
class GitHubWithLoginHint extends GitHubStrategy {
  override authorizationParams(options: { login?: unknown }): object {
    return typeof options.login === 'string' && options.login ? { login: options.login } : {};
  }
}

/** A passport instance for this app: GitHub (or the local stand-in) in, user id in the session. */
export function createPassport(config: Config, log: Logger): PassportStatic {
  const p = new passport.Passport() as unknown as PassportStatic;
  const gh = config.github;
  p.use(
    'github',
    new GitHubWithLoginHint(
      {
        clientID: gh.clientId,
        clientSecret: gh.clientSecret,
        callbackURL: `${config.publicUrl}/auth/github/callback`,
        authorizationURL: `${gh.baseUrl}/login/oauth/authorize`,
        tokenURL: `${gh.baseUrl}/login/oauth/access_token`,
        userProfileURL: `${gh.apiUrl}/user`,
        userEmailURL: `${gh.apiUrl}/user/emails`,
        scope: ['user:email'],
        state: true as unknown as string,
      },
      (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: unknown, info?: unknown) => void) => {
        const json = (profile as Profile & { _json?: { avatar_url?: string | null } })._json;
        signInFromGithub(
          {
            githubId: String(profile.id),
            login: profile.username ?? String(profile.id),
            name: profile.displayName || null,
            email: profile.emails?.[0]?.value ?? null,
            avatarUrl: json?.avatar_url ?? profile.photos?.[0]?.value ?? null,
          },
          config.adminLogins,
        )
          .then(async ({ user, created }) => {
            if (created) {
              await enqueueMail(user, welcomeMail(user.login, APP_URL), { essential: false, kind: 'account' });
              kickOutbox();
            }
            done(null, user);
          })
          .catch((err: unknown) => {
            if (err instanceof AppError && err.code === 'account_suspended') return done(null, false, { message: err.code });
            log.error({ err }, 'sign-in failed');
            done(err);
          });
      },
    ),
  );
  p.serializeUser((user, done) => done(null, (user as { id: number }).id));
  p.deserializeUser((id: number, done) => {
    findActiveUser(id).then((u) => done(null, u ?? false), done);
  });
  return p;
}

import type { Express } from 'express';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadConfig, type Config } from '../../server/config.ts';
import { createApp, type AppHandle } from '../../server/app.ts';
import { createLogger } from '../../server/logger.ts';
import { createMailer } from '../../server/services/mail.service.ts';
import { startOAuthStandIn, type OAuthStandIn } from '../../server/dev/oauth-standin.ts';
import { startSmtpCatcher, type SmtpCatcher } from '../../server/dev/smtp-catcher.ts';
import { initModels } from '../../server/models/index.ts';

export interface TestApp {
  app: Express;
  handle: AppHandle;
  config: Config;
  oauth: OAuthStandIn;
  mail: SmtpCatcher;
  close(): Promise<void>;
  /** Models are bound per process; after a second app in the same file closes, bind them back to this one. */
  rebind(): void;
}

/**
 * The real app against the throwaway MariaDB that `npm test` started (its DB_* variables),
 * with its own OAuth stand-in and SMTP catcher on free ports.
 */
export async function startTestApp(overrides: Partial<Config> = {}): Promise<TestApp> {
  const oauth = await startOAuthStandIn(0);
  const mail = await startSmtpCatcher(0, null);
  const ownUploads = overrides.uploadsDir ? null : mkdtempSync(join(tmpdir(), 'scanwright-uploads-'));
  const base = loadConfig({ ...process.env, NODE_ENV: 'test', RATE_LIMITS: 'false' });
  const config: Config = {
    ...base,
    publicUrl: 'http://127.0.0.1:3999',
    github: { ...base.github, baseUrl: oauth.url, apiUrl: oauth.url, standIn: true },
    smtpUrl: mail.smtpUrl,
    uploadsDir: ownUploads ?? base.uploadsDir,
    ...overrides,
  };
  const log = createLogger(config.logLevel);
  const handle = await createApp(config, { mailer: createMailer(mail.smtpUrl, config.mailFrom, log), log });
  return {
    app: handle.app,
    handle,
    config,
    oauth,
    mail,
    rebind: () => void initModels(handle.sequelize),
    async close() {
      await handle.close();
      await oauth.close();
      await mail.close();
      if (ownUploads) rmSync(ownUploads, { recursive: true, force: true });
    },
  };
}

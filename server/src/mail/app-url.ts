import type { Env } from '../config/env.js';

/** The address people open Breakline at, for links in e-mails, without a trailing slash. */
export function appUrl(env: Env): string {
  return (env.APP_URL ?? `http://${env.HOST}:${env.PORT}`).replace(/\/+$/, '');
}

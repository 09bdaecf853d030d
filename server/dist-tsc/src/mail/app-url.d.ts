import type { Env } from '../config/env.js';
/** The address people open Breakline at, for links in e-mails, without a trailing slash. */
export declare function appUrl(env: Env): string;

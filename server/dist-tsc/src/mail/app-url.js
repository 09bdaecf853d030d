/** The address people open Breakline at, for links in e-mails, without a trailing slash. */
export function appUrl(env) {
    return (env.APP_URL ?? `http://${env.HOST}:${env.PORT}`).replace(/\/+$/, '');
}
//# sourceMappingURL=app-url.js.map
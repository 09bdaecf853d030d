// The local SMTP fake the start and test scripts use (plain ESM, no types), started inside a test.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
// A non-literal specifier keeps the compiler from looking for declarations.
const SMTP_FAKE = '../../../scripts/lib/smtp-fake.mjs';
export async function startSmtpFake() {
    const dir = mkdtempSync(join(tmpdir(), 'breakline-mail-'));
    const fake = await (await import(SMTP_FAKE)).startSmtpFake({ dir, port: 0 });
    return { ...fake, close: async () => { await fake.stop(); rmSync(dir, { recursive: true, force: true }); } };
}
/** Settings that point the server at the fake, with its caught-mail folder. */
export const mailEnv = (f) => ({ SMTP_HOST: f.host, SMTP_PORT: String(f.port), MAIL_CAUGHT_DIR: f.dir });
/** The token of the first Breakline link in a mail's text. */
export function tokenIn(text) {
    const m = /#token=([A-Za-z0-9._-]+)/.exec(text);
    if (!m)
        throw new Error(`No link with a token in this mail:\n${text}`);
    return m[1];
}
export const to = (address) => (m) => m.to.includes(address);
//# sourceMappingURL=smtp-fake.js.map
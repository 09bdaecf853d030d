export interface CaughtMail {
    id: string;
    at: string;
    from: string;
    to: string[];
    subject: string;
    text: string;
    tag: string | null;
}
export interface SmtpFake {
    host: string;
    port: number;
    dir: string;
    messages(): CaughtMail[];
    waitFor(match: (m: CaughtMail) => boolean, ms?: number): Promise<CaughtMail>;
    refuseNext(n: number, match?: (m: CaughtMail) => boolean): void;
    attempts(): number;
    stop(): Promise<void>;
}
export declare function startSmtpFake(): Promise<SmtpFake & {
    close: () => Promise<void>;
}>;
/** Settings that point the server at the fake, with its caught-mail folder. */
export declare const mailEnv: (f: SmtpFake) => Record<string, string>;
/** The token of the first Breakline link in a mail's text. */
export declare function tokenIn(text: string): string;
export declare const to: (address: string) => (m: CaughtMail) => boolean;

/** One e-mail, self-contained so a retried job needs nothing else from the database. */
export interface MailMessage {
    to: string;
    subject: string;
    text: string;
    /** What the mail is for, for the log: invite, password-reset, stand-down, award-lapsing. */
    tag: string;
}
export declare const MAIL_QUEUE = "mail.send";

/** E-mail over SMTP, sent by jobs; and the caught-mail page of the local mail catcher. */
export declare class MailModule {
}

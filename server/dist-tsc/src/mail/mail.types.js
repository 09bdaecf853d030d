export const MAIL_QUEUE = 'mail.send';
//# sourceMappingURL=mail.types.js.map
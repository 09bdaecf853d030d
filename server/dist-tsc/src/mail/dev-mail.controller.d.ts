import { type Principal } from '../auth/principal.js';
import { CaughtMailService, type CaughtMailDto } from './caught-mail.service.js';
/** Mail the local catcher caught: on only where MAIL_CAUGHT_DIR is set (npm start, npm test). */
export declare class DevMailController {
    private readonly caught;
    constructor(caught: CaughtMailService);
    mail(p: Principal): Promise<CaughtMailDto[]>;
}

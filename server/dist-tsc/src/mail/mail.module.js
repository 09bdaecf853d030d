var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
import { Global, Module } from '@nestjs/common';
import { MailService } from './mail.service.js';
import { CaughtMailService } from './caught-mail.service.js';
import { DevMailController } from './dev-mail.controller.js';
/** E-mail over SMTP, sent by jobs; and the caught-mail page of the local mail catcher. */
let MailModule = class MailModule {
};
MailModule = __decorate([
    Global(),
    Module({
        controllers: [DevMailController],
        providers: [MailService, CaughtMailService],
        exports: [MailService],
    })
], MailModule);
export { MailModule };
//# sourceMappingURL=mail.module.js.map
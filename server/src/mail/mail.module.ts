import { Global, Module } from '@nestjs/common';
import { MailService } from './mail.service.js';
import { CaughtMailService } from './caught-mail.service.js';
import { DevMailController } from './dev-mail.controller.js';

/** E-mail over SMTP, sent by jobs; and the caught-mail page of the local mail catcher. */
@Global()
@Module({
  controllers: [DevMailController],
  providers: [MailService, CaughtMailService],
  exports: [MailService],
})
export class MailModule {}

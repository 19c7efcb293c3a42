import { Global, Module } from '@nestjs/common';
import { MailService } from './mail.service.js';

/** Global: alerts, invitations and password resets all send through the one transport. */
@Global()
@Module({ providers: [MailService], exports: [MailService] })
export class MailModule {}

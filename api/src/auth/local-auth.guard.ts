import { BadRequestException, Injectable, type ExecutionContext } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import { screenInput, toFieldErrors } from '../common/validation.js';
import { SignInDto } from './dto/sign-in.dto.js';

/**
 * passport-local checks the credentials before Nest's ValidationPipe ever sees the body, and
 * would answer a missing field with a bare 401. Validate first so such requests get the usual
 * field-named 400, and hand passport the normalised (lower-cased) e-mail.
 */
@Injectable()
export class LocalAuthGuard extends AuthGuard('local') {
  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<{ body: unknown }>();
    const raw = request.body;
    // The global pipe's screen (too deep, NUL, prototype-named keys) has not run yet: guards come first.
    const problem = screenInput(raw, null);
    if (problem) throw new BadRequestException({ message: 'Some fields need another look.', details: [problem] });
    // An array or a bare string would reach class-validator as "an unknown value" with no field.
    const plain = typeof raw === 'object' && raw !== null && !Array.isArray(raw) ? raw : {};
    const body = plainToInstance(SignInDto, plain);
    const errors = await validate(body, { whitelist: true, forbidNonWhitelisted: true });
    if (errors.length) {
      throw new BadRequestException({ message: 'Some fields need another look.', details: toFieldErrors(errors) });
    }
    request.body = { email: body.email, password: body.password };
    return (await super.canActivate(context)) as boolean;
  }
}

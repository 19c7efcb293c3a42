import { Param, ParseUUIDPipe } from '@nestjs/common';
import { fieldError } from './validation.js';

/** A uuid path parameter; anything else is a 400 naming the parameter, before any lookup. */
export const IdParam = (name = 'id') =>
  Param(name, new ParseUUIDPipe({ exceptionFactory: () => fieldError(name, 'Not a valid id.') }));

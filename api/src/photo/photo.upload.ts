import {
  BadRequestException,
  Injectable,
  PayloadTooLargeException,
  UseInterceptors,
  applyDecorators,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import { FilesInterceptor } from '@nestjs/platform-fastify/multipart';
import {
  ApiBody,
  ApiConsumes,
  ApiPayloadTooLargeResponse,
  ApiUnprocessableEntityResponse,
  ApiUnsupportedMediaTypeResponse,
} from '@nestjs/swagger';
import { PHOTO_MAX_BYTES, PHOTOS_MAX_PER_REQUEST } from '@peakwise/shared';
import { catchError, type Observable } from 'rxjs';
import { fieldError } from '../common/validation.js';
import { PhotoUploadForm } from './dto/photo.view.js';

const MAX_MB = PHOTO_MAX_BYTES / 1024 / 1024;

/**
 * Limits on the parser itself, so a body over them is refused while it streams in: busboy stops
 * keeping a file at PHOTO_MAX_BYTES and the rest of the request is read and dropped.
 */
const LIMITS = {
  fileSize: PHOTO_MAX_BYTES,
  files: PHOTOS_MAX_PER_REQUEST,
  fields: 5,
  fieldSize: 1024,
  parts: PHOTOS_MAX_PER_REQUEST + 5,
};

/** The parser's own words ("File too large", "Too many files") in ours, naming the field. */
@Injectable()
export class PhotoUploadErrors implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(
      catchError((error: unknown) => {
        throw rephrase(error);
      }),
    );
  }
}

function rephrase(error: unknown): unknown {
  if (error instanceof PayloadTooLargeException && error.message === 'File too large') {
    return new PayloadTooLargeException({
      message: `A photo is larger than ${MAX_MB} MB; send a smaller one.`,
      details: [{ field: 'photos', message: `Each photo may be at most ${MAX_MB} MB.` }],
    });
  }
  if (error instanceof BadRequestException) {
    if (error.message === 'Too many files' || error.message.startsWith('Unexpected file field - photos')) {
      return fieldError('photos', `Send at most ${PHOTOS_MAX_PER_REQUEST} photos at once.`);
    }
    if (error.message.startsWith('Unexpected file field')) {
      return fieldError('photos', 'Send the photos in the form field "photos".');
    }
  }
  return error;
}

/** multipart/form-data with files in "photos", parsed in memory within the limits above. */
export const PhotoUpload = () =>
  applyDecorators(
    UseInterceptors(PhotoUploadErrors, FilesInterceptor('photos', PHOTOS_MAX_PER_REQUEST, { limits: LIMITS })),
    ApiConsumes('multipart/form-data'),
    ApiBody({ type: PhotoUploadForm }),
    ApiPayloadTooLargeResponse({ description: `A file over ${MAX_MB} MB` }),
    ApiUnsupportedMediaTypeResponse({ description: 'A file whose bytes are not JPEG, PNG or WebP' }),
    ApiUnprocessableEntityResponse({ description: 'An image that cannot be decoded, or over the pixel limit' }),
  );

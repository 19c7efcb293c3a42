import { HttpException } from '@nestjs/common';

/** An upload refused for what it is (415 wrong type, 422 unreadable or too many pixels), naming the file. */
export class PhotoRefused extends HttpException {
  constructor(status: 415 | 422, message: string) {
    super({ message, details: [{ field: 'photos', message }] }, status);
  }
}

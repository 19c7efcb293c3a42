import { ApiProperty } from '@nestjs/swagger';
import { PHOTO_CAPTION_MAX_LENGTH, type UpdatePhotoRequest } from '@peakwise/shared';
import { ValidateIf } from 'class-validator';
import { IsText, TrimToNull } from '../../common/log-fields.js';
import { PageQuery } from '../../common/page-query.js';

export class UpdatePhotoDto implements UpdatePhotoRequest {
  @ApiProperty({ type: String, nullable: true, maxLength: PHOTO_CAPTION_MAX_LENGTH, description: 'null clears it' })
  @TrimToNull()
  // Required, but null (or blank text) clears it.
  @ValidateIf((_: object, value: unknown) => value !== null)
  @IsText(1, PHOTO_CAPTION_MAX_LENGTH, `Write a caption of at most ${PHOTO_CAPTION_MAX_LENGTH} characters, or null.`)
  caption: string | null;
}

/** Oldest first, like a strip read left to right. */
export class ListPhotosQuery extends PageQuery(50, 200) {}

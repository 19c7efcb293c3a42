import { ApiProperty } from '@nestjs/swagger';
import { COMMENT_MAX_LENGTH, type CreateCommentRequest } from '@peakwise/shared';
import { Trim } from '../../common/dto-helpers.js';
import { IsText } from '../../common/log-fields.js';
import { PageQuery } from '../../common/page-query.js';

export class CreateCommentDto implements CreateCommentRequest {
  @ApiProperty({ minLength: 1, maxLength: COMMENT_MAX_LENGTH, description: 'Trimmed before it is counted' })
  @Trim()
  @IsText(1, COMMENT_MAX_LENGTH, `Write a comment of 1 to ${COMMENT_MAX_LENGTH} characters.`)
  body: string;
}

/** A thread reads oldest first, like a conversation. */
export class ListCommentsQuery extends PageQuery(50, 200) {}

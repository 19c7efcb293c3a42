import { ApiProperty } from '@nestjs/swagger';
import type { CommentListResponse, CommentSubjectType, CommentView } from '@peakwise/shared';

// Documents the comment shapes (shared/src/contracts/classroom.ts) in the OpenAPI reference.

export class CommentAuthorView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ enum: ['owner', 'instructor'], description: "The log's owner, or an instructor who reads it" })
  role: 'owner' | 'instructor';
}

export class CommentViewDoc implements CommentView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: ['feeding', 'bake-plan'] }) subjectType: CommentSubjectType;
  @ApiProperty({ format: 'uuid', description: "The feeding's or the bake plan's id" }) subjectId: string;
  @ApiProperty({ type: CommentAuthorView }) author: CommentAuthorView;
  @ApiProperty() body: string;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ description: 'The viewer wrote it (and may delete it)' }) mine: boolean;
}

export class CommentListView implements CommentListResponse {
  @ApiProperty({ type: [CommentViewDoc], description: 'Oldest first' }) items: CommentViewDoc[];
  @ApiProperty({ description: "All of the thread's comments, on every page" }) total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}

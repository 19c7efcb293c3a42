import { Module } from '@nestjs/common';

/** Comment threads on feedings and bakes, between a baker and their instructors. */
@Module({})
export class CommentModule {}

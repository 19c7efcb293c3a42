import { Module } from '@nestjs/common';

/** Classes, members, invitations and joining (filled in by the classroom work). */
@Module({})
export class ClassroomModule {}

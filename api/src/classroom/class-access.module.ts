import { Global, Module } from '@nestjs/common';
import { ClassAccessRepository } from './class-access.repository.js';

/** Global: the classroom, its drill-down routes and comments all ask the same question. */
@Global()
@Module({ providers: [ClassAccessRepository], exports: [ClassAccessRepository] })
export class ClassAccessModule {}

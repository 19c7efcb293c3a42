import { Module } from '@nestjs/common';

/** The instructor's read-only view of a class: roster, progress chart, drill-down to a student's logs. */
@Module({})
export class ClassLogsModule {}

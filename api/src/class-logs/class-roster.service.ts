import { Injectable } from '@nestjs/common';
import {
  queryRoster,
  rosterEntry,
  type ClassProgressResponse,
  type RosterQuery,
  type RosterResponse,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CultureSummaryRepository } from '../culture/culture-summary.repository.js';
import { toHistory } from '../culture/culture-summary.service.js';
import { toCulture } from '../culture/culture.mapper.js';
import { ClassLogsAccess } from './class-logs.access.js';
import { ClassLogsRepository } from './class-logs.repository.js';
import { readCulture, type CultureReading } from './roster.compute.js';
import { OwnerReads } from './owner-reads.js';
import { rosterFileName, writeRosterCsv } from './roster-csv.writer.js';

/** The roster query with its page filled in (see RosterQueryDto). */
export type RosterPage = RosterQuery & { limit: number; offset: number };

interface ClassReadings {
  className: string;
  readings: CultureReading[];
  /** Students the viewer may read who have no active culture. */
  withoutCulture: { id: string; displayName: string }[];
}

@Injectable()
export class ClassRosterService {
  constructor(
    private readonly access: ClassLogsAccess,
    private readonly logs: ClassLogsRepository,
    private readonly summaries: CultureSummaryRepository,
    private readonly owner: OwnerReads,
  ) {}

  /** The culture summary's clock: the roster is read at the same "now" as the owner's page. */
  private now(): Date {
    return this.owner.summaryClock.now();
  }

  /** Every current member's active cultures, read the way their own culture pages read them. */
  private async read(account: AccountRecord, classId: string): Promise<ClassReadings> {
    await this.access.requireInstructor(account, classId);
    const [info, members] = await Promise.all([this.logs.classInfo(classId), this.logs.currentStudents(classId)]);
    const readable = await this.access.readable(
      account,
      classId,
      members.map((m) => m.id),
    );
    const students = members.filter((m) => readable.has(m.id));
    const owned = await this.logs.activeCultureIds(students.map((s) => s.id));
    const now = this.now();
    const since = Date.parse(`${info?.startsOn ?? '1970-01-01'}T00:00:00Z`);
    // Fetch first, one culture at a time, then compute: the model's arithmetic runs without
    // holding pool connections, and a large class does not queue the pool past its timeout.
    const stored = [];
    for (const { id, accountId } of owned) {
      const [row, rows] = await Promise.all([
        this.owner.cultureRows.findOwned(accountId, id),
        this.summaries.history(id),
      ]);
      const student = students.find((s) => s.id === accountId);
      if (row && student) stored.push({ student, culture: toCulture(row), history: toHistory(rows) });
    }
    const present = stored.map((c) => readCulture(c, now, since));
    const withCulture = new Set(present.map((r) => r.roster.studentId));
    return {
      className: info?.name ?? 'class',
      readings: present,
      withoutCulture: students.filter((s) => !withCulture.has(s.id)),
    };
  }

  private async entries(account: AccountRecord, classId: string) {
    const { className, readings, withoutCulture } = await this.read(account, classId);
    const now = this.now().toISOString();
    const entries = [
      ...readings.map((r) => rosterEntry(r.roster, now)),
      ...withoutCulture.map((s) =>
        rosterEntry(
          { studentId: s.id, studentName: s.displayName, culture: null, feedings: [], hoursToPeakAtReference: null },
          now,
        ),
      ),
    ];
    return { className, entries };
  }

  async roster(account: AccountRecord, classId: string, query: RosterPage): Promise<RosterResponse> {
    const { entries } = await this.entries(account, classId);
    const { rows, total } = queryRoster(entries, query);
    return { items: rows, total, limit: query.limit, offset: query.offset };
  }

  /** The same rows as the table, every one of them (no paging). */
  async csv(account: AccountRecord, classId: string, query: RosterQuery): Promise<{ fileName: string; csv: string }> {
    const { className, entries } = await this.entries(account, classId);
    const { rows } = queryRoster(entries, { ...query, limit: undefined, offset: 0 });
    return { fileName: rosterFileName(className), csv: writeRosterCsv(rows, account.temperatureUnit) };
  }

  /** Each culture's completed feedings since the class began, restated at 1:1:1 and 24 °C. */
  async progress(account: AccountRecord, classId: string): Promise<ClassProgressResponse> {
    const { readings } = await this.read(account, classId);
    const series = readings.map(({ roster, points }) => ({
      studentId: roster.studentId,
      studentName: roster.studentName,
      cultureId: roster.culture?.id ?? '',
      cultureName: roster.culture?.name ?? '',
      points,
    }));
    series.sort((a, b) => a.studentName.localeCompare(b.studentName) || a.cultureName.localeCompare(b.cultureName));
    return { series };
  }
}

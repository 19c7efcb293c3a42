import { Injectable, NotFoundException } from '@nestjs/common';
import type {
  CreateCultureRequest,
  Culture,
  CultureListQuery,
  CultureListResponse,
  CultureSort,
  UpdateCultureRequest,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { fieldError } from '../common/validation.js';
import { PhotoTrash } from '../photo/photo.trash.js';
import { toCulture } from './culture.mapper.js';
import { CultureRepository, type CultureRow, type ParentProblem } from './culture.repository.js';

/** The list query with its defaults filled in (see ListCulturesQuery). */
export type CulturePage = CultureListQuery & { sort: CultureSort; limit: number; offset: number };

const PARENT_PROBLEMS: Record<ParentProblem, string> = {
  'no-parent': 'Choose one of your own cultures as the parent.',
  cycle: 'A culture cannot descend from itself or from one of its descendants.',
};

@Injectable()
export class CultureService {
  constructor(
    private readonly cultures: CultureRepository,
    private readonly alerts: AlertScheduler,
    private readonly photoTrash: PhotoTrash,
  ) {}

  /** The account's culture, or 404 — also for another account's id, so ids reveal nothing. */
  async requireOwned(account: AccountRecord, id: string): Promise<CultureRow> {
    const row = await this.cultures.findOwned(account.id, id);
    if (!row) throw new NotFoundException('No culture with this id.');
    return row;
  }

  async get(account: AccountRecord, id: string): Promise<Culture> {
    return toCulture(await this.requireOwned(account, id));
  }

  async list(account: AccountRecord, query: CulturePage): Promise<CultureListResponse> {
    // Names read A→Z; "last fed" is most useful newest first.
    const order = query.order ?? (query.sort === 'name' ? 'asc' : 'desc');
    const { items, total } = await this.cultures.list(account.id, { ...query, order });
    return { items: items.map(toCulture), total, limit: query.limit, offset: query.offset };
  }

  async create(account: AccountRecord, request: CreateCultureRequest): Promise<Culture> {
    const result = await this.cultures.insert(account.id, request);
    if (result === 'no-parent') throw fieldError('parentCultureId', PARENT_PROBLEMS[result]);
    return this.get(account, result.id);
  }

  async update(account: AccountRecord, id: string, changes: UpdateCultureRequest): Promise<Culture> {
    await this.requireOwned(account, id);
    const result = await this.cultures.update(account.id, id, changes);
    if (result === 'no-parent' || result === 'cycle') throw fieldError('parentCultureId', PARENT_PROBLEMS[result]);
    if (result === 'not-found') throw new NotFoundException('No culture with this id.');
    // Location (routine, ready alerts) and archiving change which alerts the culture wants.
    await this.alerts.refreshCulture(id);
    return this.get(account, id);
  }

  async delete(account: AccountRecord, id: string): Promise<void> {
    if (!(await this.cultures.delete(account.id, id))) throw new NotFoundException('No culture with this id.');
    // Its feedings' photos went with it; their images leave the bucket now.
    await this.photoTrash.empty();
  }
}

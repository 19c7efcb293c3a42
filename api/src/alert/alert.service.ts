import { Injectable, NotFoundException } from '@nestjs/common';
import {
  defaultAlertPreferences,
  mergeAlertPreferences,
  type Alert,
  type AlertListResponse,
  type AlertPreferences,
  type UpdateAlertPreferencesRequest,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertListRepository } from './alert-list.repository.js';
import { AlertRepository, type AlertRow } from './alert.repository.js';
import { AlertScheduler } from './alert.scheduler.js';

function toAlert(row: AlertRow): Alert {
  return {
    id: row.id,
    kind: row.kind,
    subjectType: row.subjectType,
    subjectId: (row.subjectType === 'culture' ? row.cultureId : row.planId) ?? '',
    title: row.title,
    body: row.body,
    linkPath: row.linkPath,
    dueAt: row.dueAt.toISOString(),
    deliveredAt: (row.sentAt ?? row.dueAt).toISOString(),
    readAt: row.readAt?.toISOString() ?? null,
  };
}

/** The Alerts page and the alert settings; every query is scoped to the signed-in account. */
@Injectable()
export class AlertService {
  constructor(
    private readonly alerts: AlertRepository,
    private readonly page: AlertListRepository,
    private readonly scheduler: AlertScheduler,
  ) {}

  async list(account: AccountRecord, page: { limit: number; offset: number }): Promise<AlertListResponse> {
    const { items, total } = await this.page.list(account.id, page);
    return { items: items.map(toAlert), total, limit: page.limit, offset: page.offset };
  }

  async unreadCount(account: AccountRecord): Promise<{ unread: number }> {
    return { unread: await this.page.unreadCount(account.id) };
  }

  /** Another account's alert (or one not shown yet) is a 404, like one that does not exist. */
  async markRead(account: AccountRecord, id: string): Promise<Alert> {
    const row = await this.page.markRead(account.id, id);
    if (!row) throw new NotFoundException('No alert with this id.');
    return toAlert(row);
  }

  async markAllRead(account: AccountRecord): Promise<{ marked: number }> {
    return { marked: await this.page.markAllRead(account.id) };
  }

  async preferences(account: AccountRecord): Promise<AlertPreferences> {
    return (await this.alerts.preferences(account.id)) ?? defaultAlertPreferences();
  }

  /**
   * New preferences apply at once: pending alerts move with the lead time, their deliveries with
   * the quiet hours and channels (and the worker reads them again at send time).
   */
  async updatePreferences(account: AccountRecord, patch: UpdateAlertPreferencesRequest): Promise<AlertPreferences> {
    const next = mergeAlertPreferences(await this.preferences(account), patch);
    await this.alerts.savePreferences(account.id, next);
    await this.scheduler.refreshAccount(account.id);
    return next;
  }
}

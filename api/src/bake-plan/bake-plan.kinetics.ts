import { Injectable } from '@nestjs/common';
import { fitCultureKinetics, type CultureKinetics } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { observedFeeding } from '../culture/culture-summary.compute.js';
import { CultureSummaryRepository } from '../culture/culture-summary.repository.js';
import { toHistory } from '../culture/culture-summary.service.js';
import { CultureService } from '../culture/culture.service.js';

export interface PlanCulture {
  id: string;
  /** Null: the planner's published defaults (no feeding with an observed peak yet). */
  kinetics: CultureKinetics | null;
}

/**
 * A culture's own kinetics for the planner, through the culture summary's query and its reading of
 * each feeding. Unlike the summary, which leaves out the feeding still rising, every feeding whose
 * peak was observed counts here: a bake is planned from all that is known.
 */
@Injectable()
export class PlanKineticsSource {
  constructor(
    private readonly cultures: CultureService,
    private readonly summaries: CultureSummaryRepository,
  ) {}

  /** The account's culture (else 404, like any other id) and its kinetics as of `now`. */
  async forCulture(account: AccountRecord, cultureId: string, now: Date): Promise<PlanCulture> {
    const culture = await this.cultures.requireOwned(account, cultureId);
    const history = toHistory(await this.summaries.history(culture.id));
    const observed = history.flatMap((h) => {
      const o = observedFeeding(h);
      return o ? [o] : [];
    });
    return {
      id: culture.id,
      kinetics: observed.length > 0 ? fitCultureKinetics(observed, { asOf: now.toISOString() }) : null,
    };
  }
}

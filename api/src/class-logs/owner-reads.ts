import { Injectable, type OnModuleInit } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { BakePlanService } from '../bake-plan/bake-plan.service.js';
import { CultureSummaryService, SummaryClock } from '../culture/culture-summary.service.js';
import { CultureRepository } from '../culture/culture.repository.js';
import { RiseCheckService } from '../rise-check/rise-check.service.js';

/**
 * The owner's own read paths, the very instances their modules made (looked up across modules,
 * since those modules keep them to themselves). Not a second copy: one clock per feature, so a
 * test or a fix that moves it moves the instructor's view too, and a number can never differ
 * between the owner's page and the instructor's. Only read methods are called.
 */
@Injectable()
export class OwnerReads implements OnModuleInit {
  cultureRows!: CultureRepository;
  summaries!: CultureSummaryService;
  summaryClock!: SummaryClock;
  riseChecks!: RiseCheckService;
  plans!: BakePlanService;

  constructor(private readonly modules: ModuleRef) {}

  onModuleInit(): void {
    const find = <T>(type: new (...args: never[]) => T): T => this.modules.get(type, { strict: false });
    this.cultureRows = find(CultureRepository);
    this.summaries = find(CultureSummaryService);
    this.summaryClock = find(SummaryClock);
    this.riseChecks = find(RiseCheckService);
    this.plans = find(BakePlanService);
  }
}

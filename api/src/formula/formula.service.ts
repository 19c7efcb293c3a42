import { Injectable, NotFoundException } from '@nestjs/common';
import type {
  ComputeFormulaRequest,
  CreateFormulaRequest,
  Formula,
  FormulaComputed,
  FormulaListResponse,
  UpdateFormulaRequest,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { computeFormula, computeOrFieldError } from './formula.compute.js';
import { FormulaRepository, type FormulaFields, type FormulaRow } from './formula.repository.js';

const NOT_FOUND = 'No formula with this id.';

function toFormula(row: FormulaRow): Formula {
  return {
    id: row.id,
    name: row.name,
    notes: row.notes,
    ingredients: row.ingredients,
    blend: row.blend,
    scaling: row.scaling,
    // Stored formulas were computed before they were saved, so this does not refuse them.
    computed: computeFormula(row),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Only what the request shapes allow: the DTO class instances carry nothing else, but be plain. */
function fieldsOf(request: CreateFormulaRequest): FormulaFields {
  return {
    name: request.name,
    notes: request.notes ?? null,
    ingredients: request.ingredients.map((l) => ({ ...l })),
    blend: (request.blend ?? []).map((b) => ({ name: b.name, parts: b.parts })),
    scaling: request.scaling ? { ...request.scaling } : null,
  };
}

@Injectable()
export class FormulaService {
  constructor(private readonly formulas: FormulaRepository) {}

  /** The account's formula, or 404 — also for another account's id, so ids reveal nothing. */
  private async requireOwned(account: AccountRecord, id: string): Promise<FormulaRow> {
    const row = await this.formulas.findOwned(account.id, id);
    if (!row) throw new NotFoundException(NOT_FOUND);
    return row;
  }

  /** Stateless: the editor's live view of a formula that need not be saved. */
  compute(request: ComputeFormulaRequest): FormulaComputed {
    return computeOrFieldError(request);
  }

  async get(account: AccountRecord, id: string): Promise<Formula> {
    return toFormula(await this.requireOwned(account, id));
  }

  async list(account: AccountRecord, page: { limit: number; offset: number }): Promise<FormulaListResponse> {
    const { items, total } = await this.formulas.list(account.id, page);
    return {
      items: items.map((r) => ({ ...r, updatedAt: r.updatedAt.toISOString() })),
      total,
      limit: page.limit,
      offset: page.offset,
    };
  }

  async create(account: AccountRecord, request: CreateFormulaRequest): Promise<Formula> {
    const fields = fieldsOf(request);
    // A formula is saved only if it computes: no cup without a way to weigh it, no formula without flour.
    computeOrFieldError(fields);
    const id = await this.formulas.insert(account.id, fields);
    return this.get(account, id);
  }

  async update(account: AccountRecord, id: string, changes: UpdateFormulaRequest): Promise<Formula> {
    const current = await this.requireOwned(account, id);
    const merged = fieldsOf({
      name: changes.name ?? current.name,
      notes: changes.notes === undefined ? current.notes : changes.notes,
      ingredients: changes.ingredients ?? current.ingredients,
      blend: changes.blend ?? current.blend,
      scaling: changes.scaling === undefined ? current.scaling : changes.scaling,
    });
    computeOrFieldError(merged);
    if (!(await this.formulas.update(account.id, id, merged))) throw new NotFoundException(NOT_FOUND);
    return this.get(account, id);
  }

  async delete(account: AccountRecord, id: string): Promise<void> {
    if (!(await this.formulas.delete(account.id, id))) throw new NotFoundException(NOT_FOUND);
  }
}

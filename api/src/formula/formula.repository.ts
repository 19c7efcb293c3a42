import { Inject, Injectable } from '@nestjs/common';
import type {
  FormulaBlendFlour,
  FormulaIngredient,
  FormulaIngredientKind,
  FormulaScaleBy,
  FormulaScaling,
  FormulaUnit,
} from '@peakwise/shared';
import { sql, type Transaction } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { DB } from '../db/types.js';

export interface FormulaRow {
  id: string;
  accountId: string;
  name: string;
  notes: string | null;
  ingredients: FormulaIngredient[];
  blend: FormulaBlendFlour[];
  scaling: FormulaScaling | null;
  createdAt: Date;
  updatedAt: Date;
}

export interface FormulaListRow {
  id: string;
  name: string;
  ingredientCount: number;
  updatedAt: Date;
}

export interface FormulaFields {
  name: string;
  notes: string | null;
  ingredients: FormulaIngredient[];
  blend: FormulaBlendFlour[];
  scaling: FormulaScaling | null;
}

/** The scaling as columns: exactly the fields its `by` uses, the rest null (the table checks it). */
function scalingColumns(s: FormulaScaling | null) {
  return {
    scaleBy: s?.by ?? null,
    scaleFactor: s?.by === 'factor' ? (s.factor ?? null) : null,
    scaleDoughG: s?.by === 'dough-weight' ? (s.doughG ?? null) : null,
    scalePieces: s?.by === 'pieces' ? (s.pieces ?? null) : null,
    scalePieceG: s?.by === 'pieces' ? (s.pieceG ?? null) : null,
    scaleLossPct: s?.by === 'pieces' ? (s.lossPercent ?? null) : null,
  };
}

type ScalingColumns = Omit<ReturnType<typeof scalingColumns>, 'scaleBy'> & { scaleBy: string | null };

function scalingOf(row: ScalingColumns): FormulaScaling | null {
  switch (row.scaleBy as FormulaScaleBy | null) {
    case 'factor':
      return { by: 'factor', factor: row.scaleFactor! };
    case 'dough-weight':
      return { by: 'dough-weight', doughG: row.scaleDoughG! };
    case 'pieces': {
      const s: FormulaScaling = { by: 'pieces', pieces: row.scalePieces!, pieceG: row.scalePieceG! };
      if (row.scaleLossPct !== null) s.lossPercent = row.scaleLossPct;
      return s;
    }
    default:
      return null;
  }
}

/** Optional fields are left out of a line, not sent as null, so a saved line reads as it was typed. */
function ingredientOf(row: {
  kind: string;
  name: string;
  amount: number;
  unit: string;
  food: string | null;
  gramsPerMl: number | null;
  starterHydrationPct: number | null;
}): FormulaIngredient {
  const line: FormulaIngredient = {
    kind: row.kind as FormulaIngredientKind,
    name: row.name,
    amount: row.amount,
    unit: row.unit as FormulaUnit,
  };
  if (row.food !== null) line.food = row.food;
  if (row.gramsPerMl !== null) line.densityGPerMl = row.gramsPerMl;
  if (row.starterHydrationPct !== null) line.starterHydrationPct = row.starterHydrationPct;
  return line;
}

/** The only place SQL about formulas is written. Every query is scoped to the owning account. */
@Injectable()
export class FormulaRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  async findOwned(accountId: string, id: string): Promise<FormulaRow | undefined> {
    const row = await this.db
      .selectFrom('formula')
      .selectAll()
      .where('id', '=', id)
      .where('accountId', '=', accountId)
      .executeTakeFirst();
    if (!row) return undefined;
    const [ingredients, blend] = await Promise.all([
      this.db.selectFrom('formulaIngredient').selectAll().where('formulaId', '=', id).orderBy('position').execute(),
      this.db
        .selectFrom('formulaBlendFlour')
        .select(['name', 'parts'])
        .where('formulaId', '=', id)
        .orderBy('position')
        .execute(),
    ]);
    return {
      id: row.id,
      accountId: row.accountId,
      name: row.name,
      notes: row.notes,
      ingredients: ingredients.map(ingredientOf),
      blend,
      scaling: scalingOf(row),
      createdAt: row.createdAt,
      updatedAt: row.updatedAt,
    };
  }

  async list(accountId: string, page: { limit: number; offset: number }) {
    const where = this.db.selectFrom('formula').where('formula.accountId', '=', accountId);
    const [items, count] = await Promise.all([
      where
        .select((eb) => [
          'formula.id',
          'formula.name',
          'formula.updatedAt',
          eb
            .selectFrom('formulaIngredient')
            .select((i) => i.fn.countAll<string>().as('n'))
            .whereRef('formulaIngredient.formulaId', '=', 'formula.id')
            .as('ingredientCount'),
        ])
        .orderBy('formula.updatedAt', 'desc')
        .orderBy('formula.id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      where.select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow(),
    ]);
    const rows: FormulaListRow[] = items.map((r) => ({ ...r, ingredientCount: Number(r.ingredientCount ?? 0) }));
    return { items: rows, total: Number(count.n) };
  }

  insert(accountId: string, fields: FormulaFields): Promise<string> {
    return this.db.transaction().execute(async (trx) => {
      const { id } = await trx
        .insertInto('formula')
        .values({ accountId, name: fields.name, notes: fields.notes, ...scalingColumns(fields.scaling) })
        .returning('id')
        .executeTakeFirstOrThrow();
      await this.writeLines(trx, id, fields.ingredients, fields.blend);
      return id;
    });
  }

  /** Replaces the whole formula (the service merges a PATCH into it first). False if not the account's. */
  update(accountId: string, id: string, fields: FormulaFields): Promise<boolean> {
    return this.db.transaction().execute(async (trx) => {
      const updated = await trx
        .updateTable('formula')
        .set({ name: fields.name, notes: fields.notes, ...scalingColumns(fields.scaling), updatedAt: sql`now()` })
        .where('id', '=', id)
        .where('accountId', '=', accountId)
        .returning('id')
        .executeTakeFirst();
      if (!updated) return false;
      await trx.deleteFrom('formulaIngredient').where('formulaId', '=', id).execute();
      await trx.deleteFrom('formulaBlendFlour').where('formulaId', '=', id).execute();
      await this.writeLines(trx, id, fields.ingredients, fields.blend);
      return true;
    });
  }

  async delete(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('formula')
      .where('id', '=', id)
      .where('accountId', '=', accountId)
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }

  private async writeLines(
    trx: Transaction<DB>,
    formulaId: string,
    ingredients: FormulaIngredient[],
    blend: FormulaBlendFlour[],
  ): Promise<void> {
    await trx
      .insertInto('formulaIngredient')
      .values(
        ingredients.map((l, position) => ({
          formulaId,
          position,
          kind: l.kind,
          name: l.name,
          amount: l.amount,
          unit: l.unit,
          food: l.food ?? null,
          gramsPerMl: l.densityGPerMl ?? null,
          starterHydrationPct: l.starterHydrationPct ?? null,
        })),
      )
      .execute();
    if (blend.length > 0) {
      await trx
        .insertInto('formulaBlendFlour')
        .values(blend.map((b, position) => ({ formulaId, position, name: b.name, parts: b.parts })))
        .execute();
    }
  }
}

import type { FormulaListQuery } from '@peakwise/shared';
import { PageQuery } from '../../common/page-query.js';

/** Newest change first. */
export class ListFormulasQuery extends PageQuery(50, 200) implements FormulaListQuery {}

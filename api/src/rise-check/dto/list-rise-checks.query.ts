import type { PageQuery as PageQueryShape } from '@peakwise/shared';
import { PageQuery } from '../../common/page-query.js';

/** A feeding has a handful of rise checks; the generous page returns them all at once. */
export class ListRiseChecksQuery extends PageQuery(200, 1000) implements PageQueryShape {}

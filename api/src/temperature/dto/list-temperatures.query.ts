import type { PageQuery as PageQueryShape } from '@peakwise/shared';
import { PageQuery } from '../../common/page-query.js';

/** A logger's series can run to hundreds of readings a night; pages are large. */
export class ListTemperaturesQuery extends PageQuery(500, 1000) implements PageQueryShape {}

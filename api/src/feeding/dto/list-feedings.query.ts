import type { FeedingListQuery, SortOrder } from '@peakwise/shared';
import { PageQuery, SortOrderParam } from '../../common/page-query.js';

export class ListFeedingsQuery extends PageQuery(50, 200) implements FeedingListQuery {
  @SortOrderParam('By fedAt; default desc (newest first)')
  order?: SortOrder;
}

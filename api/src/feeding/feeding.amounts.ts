import { GRAMS_MAX, gramsFromRatio, type CreateFeedingRequest, type FeedingGrams } from '@peakwise/shared';
import { fieldError } from '../common/validation.js';

/**
 * The weights a validated request asks for: its own, or its ratio split over its total. Only the
 * weights it names (an update may change one). The DTO has already checked the either-or rule.
 */
export function requestedGrams(request: CreateFeedingRequest): Partial<FeedingGrams> {
  if (request.ratio === undefined || request.totalG === undefined) {
    const { starterG, flourG, waterG } = request;
    return { starterG, flourG, waterG };
  }
  const grams = gramsFromRatio(request.ratio, request.totalG);
  if (!grams) throw fieldError('ratio', 'Enter a ratio starter:flour:water of numbers above 0, e.g. 1:2:2.');
  const parts = [grams.starterG, grams.flourG, grams.waterG];
  if (parts.some((g) => g <= 0)) {
    throw fieldError('totalG', 'This total is too small to split by this ratio; enter a larger total.');
  }
  if (parts.some((g) => g > GRAMS_MAX)) {
    throw fieldError('totalG', `Each part must stay at most ${GRAMS_MAX} g; enter a smaller total.`);
  }
  return grams;
}

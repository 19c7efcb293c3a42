import { HEIGHT_MAX_MM, heightFromMultiple, heightFromRisePct, type CreateRiseCheckRequest } from '@peakwise/shared';
import { fieldError } from '../common/validation.js';

/**
 * The height in mm a validated request asks for, converting "% rise" or "× initial" with the
 * feeding's initial height; undefined if it names no height (an update of other fields).
 */
export function requestedHeightMm(request: CreateRiseCheckRequest, initialHeightMm: number | null): number | undefined {
  if (request.heightMm !== undefined) return request.heightMm;
  const { risePct, multiple } = request;
  const field = risePct !== undefined ? 'risePct' : multiple !== undefined ? 'multiple' : null;
  if (!field) return undefined;
  if (initialHeightMm === null) {
    throw fieldError(
      field,
      "This feeding has no initial height to measure from; enter the height in mm, or add the feeding's initial height first.",
    );
  }
  const heightMm =
    risePct !== undefined
      ? heightFromRisePct(initialHeightMm, risePct)
      : heightFromMultiple(initialHeightMm, multiple ?? 0);
  if (heightMm <= 0 || heightMm > HEIGHT_MAX_MM) {
    throw fieldError(field, `That makes ${heightMm} mm; a height must be above 0 and at most ${HEIGHT_MAX_MM} mm.`);
  }
  return heightMm;
}

import { BadRequestException } from '@nestjs/common';
import type { FieldError } from '@peakwise/shared';

/**
 * Rise checks and temperature readings describe one feeding's rise, which starts at fedAt: none
 * may be taken before it. `times` maps each request field to its time; all offenders are named.
 */
export function requireNotBeforeFeeding(fedAt: Date, times: Array<{ field: string; at: string }>): void {
  const details: FieldError[] = times
    .filter(({ at }) => Date.parse(at) < fedAt.getTime())
    .map(({ field }) => ({ field, message: `This is before the feeding (fed at ${fedAt.toISOString()}).` }));
  if (details.length) throw new BadRequestException({ message: 'Some fields need another look.', details });
}

import { describe, expect, it } from 'vitest';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { isUnderFeeding } from './delete-feeding';
import { feedingKey } from './get-feeding';

describe('after deleting a feeding', () => {
  it('leaves its own queries alone (they would answer 404) and refreshes the rest of the logbook', () => {
    expect(isUnderFeeding(feedingKey('f1'), 'f1')).toBe(true);
    expect(isUnderFeeding([...feedingKey('f1'), 'rise-checks'], 'f1')).toBe(true);
    expect(isUnderFeeding([...feedingKey('f2'), 'temperatures'], 'f1')).toBe(false);
    expect(isUnderFeeding(logbookKeys.summary('c1'), 'f1')).toBe(false);
    expect(isUnderFeeding(logbookKeys.feedings('c1', {}), 'f1')).toBe(false);
  });
});

import { ROLES } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { NAV_ITEMS } from './nav-items';
import { activeItem, visibleFor } from './nav-match';

describe('the navigation each role gets', () => {
  it('fits a phone bar: at most five entries for every role', () => {
    for (const role of ROLES) expect(visibleFor(NAV_ITEMS, role).length, role).toBeLessThanOrEqual(5);
  });

  it('gives instructors the Classroom in the bar, and the class pages light it', () => {
    const items = visibleFor(NAV_ITEMS, 'instructor');
    expect(items.map((i) => i.label)).toContain('Classroom');
    expect(activeItem(items, '/classes/abc/cultures/def')?.label).toBe('Classroom');
  });

  it('keeps a baker’s bar as it was (they reach their classes from the top bar’s menu)', () => {
    expect(visibleFor(NAV_ITEMS, 'baker').map((i) => i.label)).toEqual([
      'Shelf',
      'Bench',
      'Formula',
      'Home',
      'Account',
    ]);
  });
});

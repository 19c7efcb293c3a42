import { describe, expect, it } from 'vitest';
import { activeItem, visibleFor, type NavTarget } from './nav-match';

const items: (NavTarget & { label: string })[] = [
  { label: 'Home', to: '/' },
  { label: 'Account', to: '/account' },
  { label: 'Admin', to: '/admin/accounts', section: '/admin', roles: ['admin'] },
];

describe('visibleFor', () => {
  it('hides role-only entries from other roles', () => {
    expect(visibleFor(items, 'baker').map((i) => i.label)).toEqual(['Home', 'Account']);
    expect(visibleFor(items, 'instructor').map((i) => i.label)).toEqual(['Home', 'Account']);
  });

  it('shows them to the role', () => {
    expect(visibleFor(items, 'admin').map((i) => i.label)).toEqual(['Home', 'Account', 'Admin']);
  });
});

describe('activeItem', () => {
  it.each([
    ['/', 'Home'],
    ['/account', 'Account'],
    ['/admin/accounts', 'Admin'],
    ['/admin', 'Admin'],
  ])('highlights the entry for %s', (pathname, label) => {
    expect(activeItem(items, pathname)?.label).toBe(label);
  });

  it('does not treat a shared prefix as the same section', () => {
    expect(activeItem(items, '/accountant')).toBeUndefined();
    expect(activeItem(items, '/nowhere')).toBeUndefined();
  });
});

describe('activeItem with more sections', () => {
  const shelf: (NavTarget & { label: string })[] = [
    { label: 'Shelf', to: '/shelf', alsoSections: ['/cultures'] },
    { label: 'Home', to: '/' },
  ];
  it.each([
    ['/shelf', 'Shelf'],
    ['/cultures/abc/feed', 'Shelf'],
    ['/', 'Home'],
  ])('highlights the entry for %s', (pathname, label) => {
    expect(activeItem(shelf, pathname)?.label).toBe(label);
  });
});

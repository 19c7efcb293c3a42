import type { Role } from '@peakwise/shared';

/** The parts of a navigation entry that decide who sees it and when it is highlighted. */
export interface NavTarget {
  /** Where the entry links to. */
  to: string;
  /** Path prefix that counts as "in this section"; defaults to `to`. */
  section?: string;
  /** Roles that see the entry; everyone signed in when left out. */
  roles?: readonly Role[];
}

export function visibleFor<T extends NavTarget>(items: readonly T[], role: Role): T[] {
  return items.filter((item) => !item.roles || item.roles.includes(role));
}

function inSection(item: NavTarget, pathname: string): boolean {
  const section = item.section ?? item.to;
  // Home ("/") is a prefix of everything, so it only matches itself.
  if (section === '/') return pathname === '/';
  return pathname === section || pathname.startsWith(`${section}/`);
}

/** The entry to highlight for `pathname`: the longest matching section wins. */
export function activeItem<T extends NavTarget>(items: readonly T[], pathname: string): T | undefined {
  let best: T | undefined;
  for (const item of items) {
    if (!inSection(item, pathname)) continue;
    if (!best || (item.section ?? item.to).length > (best.section ?? best.to).length) best = item;
  }
  return best;
}

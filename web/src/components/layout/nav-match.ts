import type { Role } from '@peakwise/shared';

/** The parts of a navigation entry that decide who sees it and when it is highlighted. */
export interface NavTarget {
  /** Where the entry links to. */
  to: string;
  /** Path prefix that counts as "in this section"; defaults to `to`. */
  section?: string;
  /** More path prefixes that count as this section (the Shelf owns /cultures/… too). */
  alsoSections?: readonly string[];
  /** Roles that see the entry; everyone signed in when left out. */
  roles?: readonly Role[];
}

export function visibleFor<T extends NavTarget>(items: readonly T[], role: Role): T[] {
  return items.filter((item) => !item.roles || item.roles.includes(role));
}

function matchedSection(item: NavTarget, pathname: string): string | undefined {
  return [item.section ?? item.to, ...(item.alsoSections ?? [])].find((section) =>
    // Home ("/") is a prefix of everything, so it only matches itself.
    section === '/' ? pathname === '/' : pathname === section || pathname.startsWith(`${section}/`),
  );
}

/** The entry to highlight for `pathname`: the longest matching section wins. */
export function activeItem<T extends NavTarget>(items: readonly T[], pathname: string): T | undefined {
  let best: T | undefined;
  let bestLength = -1;
  for (const item of items) {
    const section = matchedSection(item, pathname);
    if (section === undefined || section.length <= bestLength) continue;
    best = item;
    bestLength = section.length;
  }
  return best;
}

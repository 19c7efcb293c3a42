// Plain-text tables and the budget verdicts of `npm run bench`.

export function table(title, head, rows) {
  const cells = [head, ...rows].map((r) => r.map((c) => (c === null || c === undefined ? '–' : String(c))));
  const widths = head.map((_, i) => Math.max(...cells.map((r) => r[i].length)));
  const numeric = head.map((_, i) =>
    rows.every((r) => typeof r[i] === 'number' || /^[-+]?[\d.,]+( ?%)?$/.test(r[i] ?? '')),
  );
  const line = (r) =>
    r.map((c, i) => (numeric[i] && r !== cells[0] ? c.padStart(widths[i]) : c.padEnd(widths[i]))).join('  ');
  return [``, title, line(cells[0]), widths.map((w) => '-'.repeat(w)).join('  '), ...cells.slice(1).map(line)].join(
    '\n',
  );
}

export const fixed = (x, digits = 1) => (x === null || x === undefined || Number.isNaN(x) ? null : x.toFixed(digits));

/**
 * A budget's verdict. kind 'max': measured must stay ≤ limit (or < with strict); 'min': ≥ limit.
 * margin > 0 is headroom, < 0 the miss; `by` says it in the budget's unit and as a share of the limit.
 */
export function verdict({ name, measured, limit, kind, unit, strict = false }) {
  if (measured === null || measured === undefined || Number.isNaN(measured)) {
    return { name, measured: null, limit, kind, unit, strict, pass: false, margin: null, by: 'not measured' };
  }
  const margin = kind === 'max' ? limit - measured : measured - limit;
  const pass = strict ? margin > 0 : margin >= 0;
  const share = limit === 0 ? '' : ` (${Math.abs((100 * margin) / limit).toFixed(0)} %)`;
  const by = `${pass ? 'PASS' : 'MISS'} by ${Math.abs(margin).toFixed(unit === '×' ? 2 : 1)}${unit === '×' ? '' : ` ${unit}`}${share}`;
  return { name, measured, limit, kind, unit, strict, pass, margin, by };
}

export function budgetTable(verdicts) {
  return table(
    'Budgets',
    ['budget', 'measured', 'limit', 'result'],
    verdicts.map((v) => [
      v.name,
      v.measured === null ? null : `${v.measured.toFixed(v.unit === '×' ? 2 : 1)} ${v.unit}`,
      `${v.kind === 'max' ? (v.strict ? '<' : '≤') : '≥'} ${v.limit} ${v.unit}`,
      v.by,
    ]),
  );
}

// One benchmark row = { benchmark, baseline, product, ratio, target, met }. Each bench
// script prints its rows as `BENCH_ROW <json>` lines; run.mjs gathers them into one table.

/** Prints a row for run.mjs to collect (and shows it at once for a single bench run). */
export function emitRow(row) {
  console.log(`BENCH_ROW ${JSON.stringify(row)}`);
}

export const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Runs `fn` three times and returns the run with the median of `key`. */
export async function medianOf3(fn, key) {
  const runs = [];
  for (let i = 0; i < 3; i++) runs.push(await fn(i));
  const m = median(runs.map((r) => r[key]));
  return runs.find((r) => r[key] === m);
}

/** A row where higher product/baseline is better (throughput), target as a minimum ratio. */
export function atLeast(benchmark, baseline, product, unit, minRatio, extra = '') {
  const ratio = product / baseline;
  return {
    benchmark,
    baseline: `${fmt(baseline)} ${unit}`,
    product: `${fmt(product)} ${unit}${extra}`,
    ratio: ratio.toFixed(2),
    target: `≥ ${minRatio}×`,
    met: ratio >= minRatio,
  };
}

/** A row where lower is better (time, memory), target as a maximum ratio to the baseline. */
export function atMost(benchmark, baseline, product, unit, maxRatio, extra = '') {
  const ratio = product / baseline;
  return {
    benchmark,
    baseline: `${fmt(baseline)} ${unit}`,
    product: `${fmt(product)} ${unit}${extra}`,
    ratio: ratio.toFixed(2),
    target: `≤ ${maxRatio}×`,
    met: ratio <= maxRatio,
  };
}

export const fmt = (n) => (n >= 100 ? n.toFixed(0) : n >= 10 ? n.toFixed(1) : n.toFixed(2));

export function printTable(rows) {
  const cols = ['benchmark', 'baseline', 'product', 'ratio', 'target', 'met'];
  const cells = rows.map((r) => cols.map((c) => (c === 'met' ? (r.met === null ? '—' : r.met ? 'yes' : 'NO') : String(r[c] ?? '—'))));
  const width = cols.map((c, i) => Math.max(c.length, ...cells.map((r) => r[i].length)));
  const line = (vals) => `| ${vals.map((v, i) => v.padEnd(width[i])).join(' | ')} |`;
  console.log(line(cols));
  console.log(`|${width.map((w) => '-'.repeat(w + 2)).join('|')}|`);
  for (const r of cells) console.log(line(r));
}

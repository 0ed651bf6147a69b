/** A rectangle of the plane in world coordinates. */
export interface PlaneWindow { xMin: number; xMax: number; yMin: number; yMax: number }

/**
 * The zero set of f inside the window as polylines, by marching squares on a cells×cells grid with linear
 * interpolation along cell edges (accuracy about one cell; saddle cells resolved by the centre value).
 * Pieces are joined end to end; coordinates are rounded to 5 significant decimals of the window size.
 * For drawing only: a component smaller than a cell may be missed.
 */
export function sampleCurve(f: (x: number, y: number) => number, window: PlaneWindow, cells = 160): [number, number][][] {
  const dx = (window.xMax - window.xMin) / cells;
  const dy = (window.yMax - window.yMin) / cells;
  const unit = Math.max(dx, dy) * cells * 1e-5;
  const round = (v: number): number => Math.round(v / unit) * unit;
  const v: number[][] = [];
  for (let i = 0; i <= cells; i++) {
    v.push([]);
    for (let j = 0; j <= cells; j++) v[i]!.push(f(window.xMin + i * dx, window.yMin + j * dy));
  }
  const points = new Map<string, [number, number]>();
  const links = new Map<string, string[]>();
  const crossing = (key: string, x0: number, y0: number, x1: number, y1: number, a: number, b: number): string => {
    if (!points.has(key)) {
      const t = a / (a - b);
      points.set(key, [round(x0 + t * (x1 - x0)), round(y0 + t * (y1 - y0))]);
    }
    return key;
  };
  const link = (p: string, q: string): void => {
    links.set(p, [...(links.get(p) ?? []), q]);
    links.set(q, [...(links.get(q) ?? []), p]);
  };
  for (let i = 0; i < cells; i++) {
    for (let j = 0; j < cells; j++) {
      const x0 = window.xMin + i * dx, y0 = window.yMin + j * dy, x1 = x0 + dx, y1 = y0 + dy;
      const a = v[i]![j]!, b = v[i + 1]![j]!, c = v[i + 1]![j + 1]!, d = v[i]![j + 1]!;
      // Edges in cyclic order: bottom, right, top, left.
      const edges: string[] = [];
      if (a > 0 !== b > 0) edges.push(crossing(`h${i},${j}`, x0, y0, x1, y0, a, b));
      if (b > 0 !== c > 0) edges.push(crossing(`v${i + 1},${j}`, x1, y0, x1, y1, b, c));
      if (d > 0 !== c > 0) edges.push(crossing(`h${i},${j + 1}`, x0, y1, x1, y1, d, c));
      if (a > 0 !== d > 0) edges.push(crossing(`v${i},${j}`, x0, y0, x0, y1, a, d));
      if (edges.length === 2) link(edges[0]!, edges[1]!);
      if (edges.length === 4) {
        const centre = f(x0 + dx / 2, y0 + dy / 2);
        // Join the crossings around the corner whose sign differs from the centre's.
        if (centre > 0 === a > 0) { link(edges[0]!, edges[1]!); link(edges[2]!, edges[3]!); }
        else { link(edges[0]!, edges[3]!); link(edges[1]!, edges[2]!); }
      }
    }
  }
  return chains(points, links);
}

function chains(points: Map<string, [number, number]>, links: Map<string, string[]>): [number, number][][] {
  const used = new Set<string>();
  const out: [number, number][][] = [];
  const walk = (start: string): void => {
    const chain = [start];
    used.add(start);
    let current = start;
    for (;;) {
      const next = (links.get(current) ?? []).find((k) => !used.has(k));
      if (next === undefined) break;
      used.add(next);
      chain.push(next);
      current = next;
    }
    const closed = chain.length > 2 && (links.get(current) ?? []).includes(start);
    const line = chain.map((k) => points.get(k)!);
    if (closed) line.push(line[0]!);
    if (line.length >= 2) out.push(line);
  };
  // Open chains first (start at an end with a single link), then the closed loops that remain.
  for (const [k, l] of [...links].sort(([a], [b]) => (a < b ? -1 : 1))) if (l.length === 1 && !used.has(k)) walk(k);
  for (const k of [...links.keys()].sort()) if (!used.has(k)) walk(k);
  return out;
}

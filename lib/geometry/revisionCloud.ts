/**
 * The revision cloud of the drawing office: a scalloped outline drawn round a changed part of a
 * drawing, here round a rectangle grown by a margin. Each side is cut into arcs of about the
 * asked length, every arc bulging outwards; the outline comes back as one closed polygon of
 * sampled points (clockwise with y pointing down, as on screen and on the sheet), so an SVG
 * path and a PDF polygon draw exactly the same cloud. Also the delta triangle that carries the
 * revision letter beside a cloud.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
import type { Rect } from './rect';

export interface CloudOptions {
  /** How far the cloud stands off the rectangle before its arcs bulge (≥ 0). */
  margin: number;
  /** Target chord length of one scallop (> 0); each side gets a whole number of them. */
  arc: number;
  /** Height of each scallop as a share of its chord (0 < bulge ≤ 0.5; 0.5 is a half circle). */
  bulge?: number;
  /** Points sampled along each scallop, ends included (≥ 3). */
  samples?: number;
}

/** The closed outline as [x, y] points; the first point is not repeated at the end. */
export function revisionCloud(r: Rect, o: CloudOptions): [number, number][] {
  const bulge = Math.min(0.5, Math.max(0.05, o.bulge ?? 0.3));
  const samples = Math.max(3, Math.round(o.samples ?? 7));
  const m = Math.max(0, o.margin);
  const x0 = r.x0 - m, y0 = r.y0 - m, x1 = r.x1 + m, y1 = r.y1 + m;
  // Clockwise on screen (y down): top left→right, right top→bottom, bottom right→left, left bottom→top.
  const corners: [number, number][] = [[x0, y0], [x1, y0], [x1, y1], [x0, y1]];
  const out: [number, number][] = [];
  for (let side = 0; side < 4; side++) {
    const [ax, ay] = corners[side];
    const [bx, by] = corners[(side + 1) % 4];
    const len = Math.hypot(bx - ax, by - ay);
    const n = Math.max(1, Math.round(len / Math.max(o.arc, 1e-9)));
    const ux = len > 0 ? (bx - ax) / len : 0;
    const uy = len > 0 ? (by - ay) / len : 0;
    // Outward normal of a clockwise (y-down) walk.
    const nx = uy, ny = -ux;
    for (let k = 0; k < n; k++) {
      const c = len / n;
      if (c === 0) continue;
      const px = ax + ux * c * k, py = ay + uy * c * k;
      const mx = px + (ux * c) / 2, my = py + (uy * c) / 2;
      const h = bulge * c;
      const R = (c * c / 4 + h * h) / (2 * h);
      const cx = mx - nx * (R - h), cy = my - ny * (R - h);
      const alpha = Math.asin(Math.min(1, c / (2 * R)));
      // The last sample of each scallop is the first of the next: leave it out.
      for (let i = 0; i < samples - 1; i++) {
        const phi = -alpha + (2 * alpha * i) / (samples - 1);
        out.push([cx + R * (Math.sin(phi) * ux + Math.cos(phi) * nx), cy + R * (Math.sin(phi) * uy + Math.cos(phi) * ny)]);
      }
    }
  }
  return out;
}

/** An upright equilateral triangle of side `side` whose centroid is at (cx, cy): the delta of a revision mark. */
export function deltaTriangle(cx: number, cy: number, side: number): [number, number][] {
  const h = (Math.sqrt(3) / 2) * side;
  return [[cx, cy - (2 * h) / 3], [cx + side / 2, cy + h / 3], [cx - side / 2, cy + h / 3]];
}

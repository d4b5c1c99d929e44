/**
 * The one symbol table for module kinds: what is drawn inside a module's outline to say what it is
 * (sink bowl and waste, hob rings, fridge star, tank fill line, gas cylinders, a bolt for the
 * electrics, heat waves, pan, shower fall lines, pillow, backrest, hanging rail, drawer fronts,
 * table top, tread arrows) and the heavy mark on its working face. Each symbol is a list of plain
 * shapes in the module's own millimetre frame (x along its length, y across its width, origin at
 * its min corner); the editor draws them with Konva and the plan sheet with its PDF/SVG primitives,
 * so the screen and the paper show the same thing. Pure data; must never draw or import a renderer.
 */
import type { Facing, ModuleKind } from '../layout/schema';

/** `heavy` is the working-face mark; `thin` every other line; `none` a fill alone. */
export type SymbolStroke = 'thin' | 'heavy' | 'none';
/** Dashes are named, not measured: each renderer sizes them for its medium. */
export type SymbolDash = 'dashed' | 'dotted';
/** `paper` blanks what lies below (a pillow over the bed's stipple), `shade` tints, `water` marks a tank's contents. */
export type SymbolFill = 'paper' | 'shade' | 'water';

export interface PathShape { type: 'path'; points: [number, number][]; closed?: boolean; stroke?: SymbolStroke; dash?: SymbolDash; fill?: SymbolFill }
export interface CircleShape { type: 'circle'; cx: number; cy: number; r: number; stroke?: SymbolStroke; dash?: SymbolDash; fill?: SymbolFill }
export type SymbolShape = PathShape | CircleShape;

export interface SymbolModule {
  kind: ModuleKind;
  length: number;
  width: number;
  facing: Facing;
  props?: Record<string, unknown>;
}

type P = [number, number];

/** The symbol of a module, working-face mark last. */
export function moduleSymbol(m: SymbolModule): SymbolShape[] {
  return [...kindSymbol(m), facingMark(m)];
}

function kindSymbol(m: SymbolModule): SymbolShape[] {
  const L = m.length, W = m.width;
  const cx = L / 2, cy = W / 2;
  const short = Math.min(L, W);
  switch (m.kind) {
    case 'sink-unit': {
      const bw = L * 0.62, bh = W * 0.55;
      return [roundRect(cx - bw / 2, cy - bh / 2, bw, bh, Math.min(bw, bh) * 0.2), { type: 'circle', cx, cy, r: short * 0.05 }];
    }
    case 'hob': {
      const n = clampInt(m.props?.burners, 1, 4, 2);
      const cols = n <= 2 ? n : 2;
      const rows = Math.ceil(n / cols);
      const r = Math.min(L / cols, W / rows) * 0.3;
      const out: SymbolShape[] = [];
      for (let i = 0; i < n; i++) {
        const x = (L / cols) * ((i % cols) + 0.5);
        const y = (W / rows) * (Math.floor(i / cols) + 0.5);
        out.push({ type: 'circle', cx: x, cy: y, r }, { type: 'circle', cx: x, cy: y, r: r * 0.45 });
      }
      return out;
    }
    case 'fridge': {
      const r = short * 0.22;
      return [0, 1, 2].map((i) => {
        const a = (Math.PI / 3) * i;
        return path([[cx - Math.cos(a) * r, cy - Math.sin(a) * r], [cx + Math.cos(a) * r, cy + Math.sin(a) * r]]);
      });
    }
    case 'fresh-water-tank':
    case 'grey-water-tank': {
      // Fill line at the tank's level (props.fillLevel 0..1, three quarters if not given).
      const level = clamp01(m.props?.fillLevel, 0.75);
      const y = W * (1 - level);
      return [
        { type: 'path', points: [[0, y], [L, y], [L, W], [0, W]], closed: true, fill: 'water', stroke: 'none' },
        { ...path([[0, y], [L, y]]), dash: m.kind === 'grey-water-tank' ? 'dashed' : undefined },
      ];
    }
    case 'gas-locker': {
      const n = clampInt(m.props?.cylinders, 1, 3, 1);
      const r = Math.min(L / n, W) * 0.3;
      return Array.from({ length: n }, (_, i) => ({ type: 'circle' as const, cx: (L / n) * (i + 0.5), cy, r }));
    }
    case 'electrics-bay': {
      const h = short * 0.5;
      return [path([[cx + h * 0.15, cy - h / 2], [cx - h * 0.2, cy + h * 0.05], [cx + h * 0.15, cy + h * 0.05], [cx - h * 0.15, cy + h / 2]])];
    }
    case 'heater':
      return [0, 1, 2].map((k) => {
        const x0 = L * (0.3 + 0.2 * k);
        return path(cubic([x0, W * 0.2], [x0 + L * 0.08, W * 0.4], [x0 - L * 0.08, W * 0.6], [x0, W * 0.8]));
      });
    case 'toilet-cabinet':
      return [{ type: 'path', points: ellipse(cx, cy, L * 0.28, W * 0.34), closed: true }];
    case 'shower-tray':
      return [path([[0, 0], [L, W]]), path([[L, 0], [0, W]]), { type: 'circle', cx, cy, r: short * 0.06, fill: 'paper' }];
    case 'bed-platform': {
      // Pillow at the end nearest the cab unless the bed faces rearwards.
      const alongX = L >= W;
      const pw = alongX ? Math.min(L * 0.14, 300) : L * 0.7;
      const ph = alongX ? W * 0.7 : Math.min(W * 0.14, 300);
      const x0 = alongX ? (m.facing === 'rear' ? L - pw - L * 0.04 : L * 0.04) : (L - pw) / 2;
      const y0 = alongX ? (W - ph) / 2 : W * 0.04;
      return [{ ...roundRect(x0, y0, pw, ph, Math.min(pw, ph) * 0.2), fill: 'paper' }];
    }
    case 'bench-seat':
    case 'seat': {
      // Backrest band on the side opposite the face the seat is used from; a belted seat shows a sash.
      const band = Math.min(short * 0.22, 120);
      const out: SymbolShape[] = [{ type: 'path', points: bandRect(opposite(m.facing), L, W, band), closed: true, fill: 'shade' }];
      if (m.kind === 'seat' && m.props?.belted) out.push(path([[L * 0.25, W * 0.25], [L * 0.75, W * 0.75]]));
      return out;
    }
    case 'wardrobe':
      return [{ ...path(L >= W ? [[L * 0.1, cy], [L * 0.9, cy]] : [[cx, W * 0.1], [cx, W * 0.9]]), dash: 'dashed' }];
    case 'drawer-unit': {
      const across = m.facing === 'left' || m.facing === 'right';
      return [1, 2, 3].map((i) => {
        const t = i / 4;
        return path(across ? [[L * 0.15, W * t], [L * 0.85, W * t]] : [[L * t, W * 0.15], [L * t, W * 0.85]]);
      });
    }
    case 'table':
      return [roundRect(L * 0.08, W * 0.08, L * 0.84, W * 0.84, short * 0.1)];
    case 'step':
      return [0.35, 0.6].map((t) => path([[L * (t - 0.12), W * 0.25], [L * t, cy], [L * (t - 0.12), W * 0.75]]));
    default:
      return [];
  }
}

/** A short heavy bar on the working face: the side the module is used from. */
function facingMark(m: SymbolModule): SymbolShape {
  const L = m.length, W = m.width, f = 0.3;
  const points: P[] =
    m.facing === 'front' ? [[0, W * f], [0, W * (1 - f)]]
      : m.facing === 'rear' ? [[L, W * f], [L, W * (1 - f)]]
        : m.facing === 'left' ? [[L * f, 0], [L * (1 - f), 0]]
          : [[L * f, W], [L * (1 - f), W]];
  return { type: 'path', points, stroke: 'heavy' };
}

/** A circle as a closed polygon, for renderers without circles (the sheet). */
export function circlePoints(cx: number, cy: number, r: number, segments = 24): P[] {
  return ellipse(cx, cy, r, r, segments);
}

function path(points: P[]): PathShape {
  return { type: 'path', points };
}

function ellipse(cx: number, cy: number, rx: number, ry: number, segments = 32): P[] {
  return Array.from({ length: segments }, (_, i) => {
    const a = (2 * Math.PI * i) / segments;
    return [cx + Math.cos(a) * rx, cy + Math.sin(a) * ry] as P;
  });
}

function roundRect(x: number, y: number, w: number, h: number, r: number): PathShape {
  const rr = Math.max(0, Math.min(r, w / 2, h / 2));
  const corner = (ox: number, oy: number, from: number): P[] =>
    [0, 1, 2, 3].map((i) => {
      const a = from + (Math.PI / 2) * (i / 3);
      return [ox + Math.cos(a) * rr, oy + Math.sin(a) * rr] as P;
    });
  const points = [
    ...corner(x + w - rr, y + rr, -Math.PI / 2),
    ...corner(x + w - rr, y + h - rr, 0),
    ...corner(x + rr, y + h - rr, Math.PI / 2),
    ...corner(x + rr, y + rr, Math.PI),
  ];
  return { type: 'path', points, closed: true };
}

function cubic(p0: P, p1: P, p2: P, p3: P, steps = 12): P[] {
  return Array.from({ length: steps + 1 }, (_, i) => {
    const t = i / steps, u = 1 - t;
    return [
      u * u * u * p0[0] + 3 * u * u * t * p1[0] + 3 * u * t * t * p2[0] + t * t * t * p3[0],
      u * u * u * p0[1] + 3 * u * u * t * p1[1] + 3 * u * t * t * p2[1] + t * t * t * p3[1],
    ] as P;
  });
}

function opposite(f: Facing): Facing {
  return f === 'front' ? 'rear' : f === 'rear' ? 'front' : f === 'left' ? 'right' : 'left';
}

function bandRect(side: Facing, L: number, W: number, band: number): P[] {
  const [x, y, w, h] = side === 'front' ? [0, 0, band, W] : side === 'rear' ? [L - band, 0, band, W] : side === 'left' ? [0, 0, L, band] : [0, W - band, L, band];
  return [[x, y], [x + w, y], [x + w, y + h], [x, y + h]];
}

function clampInt(v: unknown, min: number, max: number, fallback: number): number {
  const n = Math.round(Number(v ?? fallback) || fallback);
  return Math.max(min, Math.min(max, n));
}

function clamp01(v: unknown, fallback: number): number {
  const n = Number(v ?? fallback);
  return Number.isFinite(n) ? Math.min(1, Math.max(0, n)) : fallback;
}

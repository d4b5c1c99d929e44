/**
 * The plan sheet's one layout model, used alike by the PDF and the SVG print view (both draw the
 * pages it fills): blocks of measured width and height on pages of one drawing area.
 *
 *   drawings  shelf-packed in order, left-aligned: side by side in a row while the row fits the
 *             drawing area's width at the chosen scale, else a new row; rows below each other
 *             while they fit the area's height, else a new page;
 *   free      what the drawings leave is kept as free regions — beside each row (the row's
 *             height) and below the last row (the area's width) — in page order;
 *   text      flows (the schedule, the mass table, the notes and cautions) take the first free
 *             region wide enough for them, then fresh pages; a narrow flow splits a wide region
 *             into columns; what a flow leaves of its last region goes back for the next flow.
 *
 * Every placed block is recorded (page, place, size, what) so tests can see that nothing overlaps.
 * Work: each region is taken and given back at most once per flow; a page adds one region.
 * Pure: must never render or read the clock.
 */
import type { Area, Column, ColumnSource } from './flow';
import type { SheetItem } from './primitives';

/** Space between blocks, mm (common practice, no source: a drawing office's usual clear gap). */
export const BLOCK_GAP = 6;
/** Free regions lower than this are not used for text: a heading and two rows need it, mm. */
export const MIN_REGION_HEIGHT = 14;

export interface Region extends Area {
  page: number;
  /** A whole empty page's column (see Column.fresh). */
  fresh?: boolean;
}

export interface PlacedBlock extends Region {
  /** What the block is, e.g. "plan:travel", "section", "text:schedule". */
  what: string;
}

/** Columns of fresh pages from `fromPage` on are capped at `height` but the last, which is full height. */
export interface Balance {
  fromPage: number;
  height: number;
}

export interface Drawing {
  what: string;
  width: number;
  height: number;
  draw: (x: number, y: number) => SheetItem[];
}

export class SheetSpace {
  readonly pages: SheetItem[][] = [];
  readonly blocks: PlacedBlock[] = [];
  /** Free regions, ordered by page, then top, then left. */
  private free: Region[] = [];

  constructor(readonly area: Area, private readonly balance: Balance | undefined, private readonly newPageItems: () => SheetItem[]) {}

  private addPage(): number {
    this.pages.push(this.newPageItems());
    return this.pages.length - 1;
  }

  /**
   * Shelf-packs the drawings (each must fit the area on its own: the caller checks): rows first,
   * in order, as many side by side as the area's width takes; then rows onto pages, as many as
   * its height takes. A row is never split, so drawings that fit side by side stay side by side.
   */
  placeDrawings(drawings: Drawing[]): void {
    const { area } = this;
    if (!drawings.length) return;
    const rows: Drawing[][] = [];
    let x = 0;
    for (const d of drawings) {
      if (rows.length && x + d.width <= area.width) rows[rows.length - 1].push(d);
      else {
        rows.push([d]);
        x = 0;
      }
      x += d.width + BLOCK_GAP;
    }
    let page = this.addPage();
    let y = 0;
    const closePage = () => {
      if (area.height - y > 0) this.offer({ page, x: area.x, y: area.y + y, width: area.width, height: area.height - y });
    };
    for (const row of rows) {
      const height = Math.max(...row.map((d) => d.height));
      if (y > 0 && y + height > area.height) {
        closePage();
        page = this.addPage();
        y = 0;
      }
      let at = 0;
      for (const d of row) {
        const bx = area.x + at;
        const by = area.y + y;
        this.pages[page].push(...d.draw(bx, by));
        this.blocks.push({ page, x: bx, y: by, width: d.width, height: d.height, what: d.what });
        at += d.width + BLOCK_GAP;
      }
      // Beside the row, as high as the row.
      if (area.width - at > 0) this.offer({ page, x: area.x + at, y: area.y + y, width: area.width - at, height });
      y += height + BLOCK_GAP;
    }
    closePage();
  }

  /**
   * Columns for one text flow: free regions at least `minWidth` wide, used whole (`split` absent)
   * or cut into columns at least `split` wide; then fresh pages. `what` names the blocks it fills.
   */
  columns(what: string, minWidth: number, split?: number): ColumnSource {
    // Regions this flow passed over (a row did not fit) go back for later flows, not for this one.
    const skipped = new Set<Region>();
    const pageOf = new Map<Column, Region>();
    return {
      next: () => {
        const i = this.free.findIndex((r) => !skipped.has(r) && r.width >= minWidth && r.height >= MIN_REGION_HEIGHT);
        let region = i >= 0 ? this.free.splice(i, 1)[0] : { page: this.addPage(), ...this.area, fresh: true };
        if (split && region.width >= 2 * split + BLOCK_GAP) {
          const k = Math.floor((region.width + BLOCK_GAP) / (split + BLOCK_GAP));
          const w = (region.width - (k - 1) * BLOCK_GAP) / k;
          const first = region;
          // Balancing: on a fresh page, all columns but the last end at the cap (and so are not "whole pages").
          const capped = first.fresh === true && this.balance !== undefined && first.page >= this.balance.fromPage && this.balance.height < first.height;
          const cap = (j: number): Partial<Region> => (capped && j < k - 1 ? { height: this.balance!.height, fresh: false } : {});
          for (let j = 1; j < k; j += 1) this.offer({ ...first, x: first.x + j * (w + BLOCK_GAP), width: w, ...cap(j) });
          region = { ...first, width: w, ...cap(0) };
        }
        const column: Column = { x: region.x, y: region.y, width: region.width, height: region.height, items: this.pages[region.page], fresh: region.fresh === true };
        pageOf.set(column, region);
        return column;
      },
      release: (column: Column, used: number) => {
        const region = pageOf.get(column)!;
        pageOf.delete(column);
        if (used <= 0) {
          skipped.add(region);
          this.offer(region);
          return;
        }
        this.blocks.push({ page: region.page, x: column.x, y: column.y, width: column.width, height: used, what });
        const top = used + BLOCK_GAP;
        if (column.height - top >= MIN_REGION_HEIGHT) this.offer({ page: region.page, x: column.x, y: column.y + top, width: column.width, height: column.height - top });
      },
    };
  }

  /** A free region, kept in page, top, left order. */
  private offer(r: Region): void {
    if (r.width <= 0 || r.height <= 0) return;
    let at = this.free.length;
    while (at > 0 && before(r, this.free[at - 1])) at -= 1;
    this.free.splice(at, 0, r);
  }
}

function before(a: Region, b: Region): boolean {
  return a.page !== b.page ? a.page < b.page : a.y !== b.y ? a.y < b.y : a.x < b.x;
}

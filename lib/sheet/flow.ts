/**
 * Flowing rows of text and tables down columns, as many as they need. The caller says how tall a
 * row is and how to draw it at a place; the flow moves on to the next column when the current one
 * is full. Columns come either from a plain drawing area (N equal columns a page, fresh pages as
 * needed: the quote document) or from a column source (the plan sheet's free space beside and
 * below its drawings, lib/sheet/sheet-layout.ts). Pure bookkeeping; must never draw itself.
 */
import type { SheetItem } from './primitives';

export interface Area {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** One column to fill: where it is, and the page items it draws into. */
export interface Column extends Area {
  items: SheetItem[];
  /** A whole empty page's column: a row taller than it is placed anyway (nothing larger will come). */
  fresh: boolean;
}

export interface ColumnSource {
  /** The next column to fill. */
  next(): Column;
  /** Ends the current page, so the next column starts a fresh one. */
  breakPage?(): void;
  /** The flow is done with `column`, having used `used` mm of its height. */
  release?(column: Column, used: number): void;
}

/** N equal columns a page over a plain area, a fresh page (from `newPage`) when the last is full. */
function pagedColumns(area: Area, columns: number, newPage: () => SheetItem[], gutter: number): { source: ColumnSource; columnWidth: number } {
  const columnWidth = (area.width - gutter * (columns - 1)) / columns;
  let page: SheetItem[] | null = null;
  let column = 0;
  const source: ColumnSource = {
    next() {
      if (!page || column + 1 >= columns) {
        page = newPage();
        column = 0;
      } else column += 1;
      return { items: page, x: area.x + column * (columnWidth + gutter), y: area.y, width: columnWidth, height: area.height, fresh: true };
    },
    breakPage() {
      page = null;
    },
  };
  return { source, columnWidth };
}

export class ColumnFlow {
  private current: Column | null = null;
  private y = 0;
  private header: { height: number; draw: (x: number, y: number, width: number) => SheetItem[] } | null = null;
  private readonly source: ColumnSource;
  /** The width text is measured (wrapped) to: every column of the flow is at least this wide. */
  readonly columnWidth: number;

  constructor(area: Area, columns: number, newPage: () => SheetItem[], gutter?: number);
  constructor(source: ColumnSource, columnWidth: number);
  constructor(a: Area | ColumnSource, b: number, newPage?: () => SheetItem[], gutter = 6) {
    if ('next' in a) {
      this.source = a;
      this.columnWidth = b;
    } else {
      const paged = pagedColumns(a, b, newPage!, gutter);
      this.source = paged.source;
      this.columnWidth = paged.columnWidth;
    }
  }

  /** Places a row of `height` mm; `draw` gets its top-left corner and the column width. */
  place(height: number, draw: (x: number, y: number, width: number) => SheetItem[], keepWithNext = 0): void {
    if (!this.current) this.advance();
    let moved = false;
    // A row (and what must stay with it) that does not fit moves on; on a whole empty page it is placed anyway.
    const need = () => (this.current!.fresh ? Math.min(height + keepWithNext, this.current!.height) : height + keepWithNext);
    while (this.y + need() > this.current!.height && !(this.y === 0 && this.current!.fresh)) {
      this.advance();
      moved = true;
    }
    if (moved && this.header) {
      const header = this.header;
      this.header = null;
      this.place(header.height, header.draw);
      this.header = header;
    }
    const c = this.current!;
    c.items.push(...draw(c.x, c.y + this.y, c.width));
    this.y += height;
  }

  /**
   * Rows placed inside `body` that start a new column or page get `draw` (a table header) first.
   * The header itself is placed once at the start.
   */
  withHeader(height: number, draw: (x: number, y: number, width: number) => SheetItem[], body: () => void): void {
    this.place(height, draw);
    this.header = { height, draw };
    try {
      body();
    } finally {
      this.header = null;
    }
  }

  /** Empty space in the current column. */
  gap(height: number): void {
    if (this.current) this.y = Math.min(this.current.height, this.y + height);
  }

  /** Ends the current page, so the next row starts a fresh one. */
  breakPage(): void {
    this.finish();
    this.source.breakPage?.();
  }

  /** Done: what is left of the current column goes back to the source. */
  finish(): void {
    if (this.current) this.source.release?.(this.current, this.y);
    this.current = null;
    this.y = 0;
  }

  private advance() {
    if (this.current) this.source.release?.(this.current, this.y);
    this.current = this.source.next();
    this.y = 0;
  }
}

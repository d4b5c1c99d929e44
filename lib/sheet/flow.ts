/**
 * Flowing rows of text and tables down the drawing area of as many pages as they need, in one or
 * more columns. The caller says how tall a row is and how to draw it at a place; the flow starts
 * a new column or page when the current one is full. Pure bookkeeping; must never draw itself.
 */
import type { SheetItem } from './primitives';

export interface Area {
  x: number;
  y: number;
  width: number;
  height: number;
}

export class ColumnFlow {
  private column = 0;
  private y = 0;
  private page: SheetItem[] | null = null;
  private header: { height: number; draw: (x: number, y: number, width: number) => SheetItem[] } | null = null;
  readonly columnWidth: number;

  constructor(
    private readonly area: Area,
    private readonly columns: number,
    private readonly newPage: () => SheetItem[],
    private readonly gutter = 6,
  ) {
    this.columnWidth = (area.width - gutter * (columns - 1)) / columns;
  }

  /** Places a row of `height` mm; `draw` gets its top-left corner and the column width. */
  place(height: number, draw: (x: number, y: number, width: number) => SheetItem[], keepWithNext = 0): void {
    if (!this.page) this.start();
    const need = Math.min(height + keepWithNext, this.area.height);
    if (this.y > 0 && this.y + need > this.area.height) {
      this.nextColumn();
      if (this.header) this.place(this.header.height, this.header.draw);
    }
    const x = this.area.x + this.column * (this.columnWidth + this.gutter);
    this.page!.push(...draw(x, this.area.y + this.y, this.columnWidth));
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
    this.y = Math.min(this.area.height, this.y + height);
  }

  /** Ends the current page, so the next row starts a fresh one. */
  breakPage(): void {
    this.page = null;
  }

  private start() {
    this.page = this.newPage();
    this.column = 0;
    this.y = 0;
  }

  private nextColumn() {
    if (this.column + 1 < this.columns) {
      this.column += 1;
      this.y = 0;
    } else this.start();
  }
}

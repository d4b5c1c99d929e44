/**
 * A 2D context for the plan's drawing functions that records what is drawn: each call with its
 * arguments and the line dash in force, and each property set as `set <name>`. Text measures 5
 * units a character; patterns are absent.
 */
export interface DrawCall {
  op: string;
  args: unknown[];
  dash: number[];
}

export function recordingContext(): { ctx: CanvasRenderingContext2D; calls: DrawCall[]; ops: () => string[] } {
  const calls: DrawCall[] = [];
  let dash: number[] = [];
  const ctx = new Proxy({} as Record<string, unknown>, {
    get(target, key: string) {
      if (key in target) return target[key];
      if (key === 'setLineDash') return (d: number[]) => { dash = d; };
      if (key === 'measureText') return (t: string) => ({ width: t.length * 5 });
      if (key === 'createPattern') return () => null;
      return (...args: unknown[]) => { calls.push({ op: key, args, dash }); };
    },
    set(target, key: string, value) {
      target[key] = value;
      calls.push({ op: `set ${key}`, args: [value], dash });
      return true;
    },
  });
  return { ctx: ctx as unknown as CanvasRenderingContext2D, calls, ops: () => calls.map((c) => c.op) };
}

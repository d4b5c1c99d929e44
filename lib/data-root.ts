/**
 * Where this process keeps its files: embedded databases, the generated auth secret, uploads,
 * the payment fake's secret. BAYWRIGHT_DATA_ROOT, or ./data. The one place that decides it.
 */
import path from 'node:path';

export function dataRoot(): string {
  // turbopackIgnore: the folder is runtime data, not something to trace into the build.
  return process.env.BAYWRIGHT_DATA_ROOT ?? path.join(/* turbopackIgnore: true */ process.cwd(), 'data');
}

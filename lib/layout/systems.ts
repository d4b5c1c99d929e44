/**
 * `doc.systems`: vehicle masses, power, water and gas for build planning. Optional, so documents
 * written before build planning stay valid.
 */
import { z } from 'zod';

export const systemsSchema = z.record(z.string().max(40), z.unknown());
export type Systems = z.infer<typeof systemsSchema>;

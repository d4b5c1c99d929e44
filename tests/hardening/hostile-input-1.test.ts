// Hostile input, half 1 of the write routes (see hostile-input.ts).
import { fuzzWriteRoutes } from './hostile-input';

fuzzWriteRoutes(0);

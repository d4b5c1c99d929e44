// Hostile input, half 2 of the write routes (see hostile-input.ts).
import { fuzzWriteRoutes } from './hostile-input';

fuzzWriteRoutes(1);

// The rainfall record's worker thread starts here, in plain JavaScript so Node runs it as it is;
// it registers tsx's loader so the TypeScript parser loads as it does on the main thread.
import { register } from 'tsx/esm/api';

register();
await import('./rainfall-record-thread.ts');

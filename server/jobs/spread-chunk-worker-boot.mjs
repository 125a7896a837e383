// Entry of a Property spread worker thread. The server runs TypeScript through tsx, and a worker
// thread does not inherit the loader, so register it here before loading the worker itself.
import { register } from 'tsx/esm/api';

register();
await import(new URL('./spread-chunk-worker.ts', import.meta.url).href);

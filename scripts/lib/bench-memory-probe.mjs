// Loaded into the API by `pnpm bench:api` (node --import): samples process.memoryUsage() every
// 250 ms and keeps, in the file BENCH_MEMORY_FILE, the sample taken at start and the one with
// the largest resident size, so the bench can say what the resident size is made of (the main
// thread's V8 heap, buffers outside it, and the rest: code, worker threads' heaps, the
// allocator's free pages). Plain JavaScript: the API's worker threads inherit the --import and
// load it before tsx is ready in them; it does nothing there.
import { writeFileSync } from 'node:fs';
import { isMainThread } from 'node:worker_threads';

const file = process.env.BENCH_MEMORY_FILE;
if (file && isMainThread) {
  const toMb = (usage) =>
    Object.fromEntries(
      Object.entries(usage).map(([key, bytes]) => [key, Math.round(bytes / 1048576)]),
    );
  const first = toMb(process.memoryUsage());
  let peak = first;
  const write = () => writeFileSync(file, JSON.stringify({ start: first, peak }));
  write();
  setInterval(() => {
    const now = toMb(process.memoryUsage());
    if (now.rss > peak.rss) {
      peak = now;
      write();
    }
  }, 250).unref();
}

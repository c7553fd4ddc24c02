// Preloaded into the real `bulkhead` CLI (and into `node -e 0`, its yardstick) by bench/run.ts with
// node --import: on exit, writes the process's peak resident memory (bytes) and CPU time (user + system,
// milliseconds) as JSON to the file named by BULKHEAD_BENCH_RSS_FILE, so the CLI itself stays untouched.
import { writeFileSync } from 'node:fs';

const target = process.env.BULKHEAD_BENCH_RSS_FILE;
if (target) {
  process.on('exit', () => {
    const usage = process.resourceUsage();
    writeFileSync(
      target,
      JSON.stringify({ maxRss: usage.maxRSS * 1024, cpuMs: (usage.userCPUTime + usage.systemCPUTime) / 1000 }),
    );
  });
}

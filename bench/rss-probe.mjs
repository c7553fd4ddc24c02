// Preloaded into the real `bulkhead` CLI by bench/run.ts (node --import): on exit, writes the process's
// peak resident memory to the file named by BULKHEAD_BENCH_RSS_FILE, so the CLI itself stays untouched.
import { writeFileSync } from 'node:fs';

const target = process.env.BULKHEAD_BENCH_RSS_FILE;
if (target) process.on('exit', () => writeFileSync(target, String(process.resourceUsage().maxRSS * 1024)));

// Preloaded into a benchmarked child process (`node --import`): at exit it writes the CPU time
// the whole process used (user + system, all threads, from getrusage via process.cpuUsage)
// to the file named by LAMINA_BENCH_CPU_FILE, one line per process in microseconds.
import { appendFileSync } from 'node:fs';

const file = process.env.LAMINA_BENCH_CPU_FILE;
if (file) {
  process.on('exit', () => {
    const { user, system } = process.cpuUsage();
    appendFileSync(file, `${user + system}\n`);
  });
}

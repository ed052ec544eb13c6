/** One benchmark figure, printed by `npm run bench` (test/bench/run.ts). */
export type BenchResult = {
  name: string;
  median_us: number;
  /** The fastest of the runs, where the figure is a min/median over several runs. */
  min_us?: number;
  baseline?: string;
  ratio?: number;
  target?: string;
  pass?: boolean;
};

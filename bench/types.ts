/** A benchmark `npm run bench` can run; add yours to the list in bench/run.ts. */
export type Benchmark = {
  name: string
  description: string
  /** Gets the command line after `npm run bench --`, options included (`--links 1000000`). */
  run: (args: string[]) => Promise<void>
}

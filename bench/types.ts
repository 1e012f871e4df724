/** A benchmark `npm run bench` can run; add yours to the list in bench/run.ts. */
export type Benchmark = {
  name: string
  description: string
  run: () => Promise<void>
}

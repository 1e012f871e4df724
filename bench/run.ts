/**
 * Runs the benchmarks: `npm run bench` for all, `npm run bench -- import-links`
 * for the named ones. Benchmarks print their figures; they are never tests.
 */
import 'reflect-metadata'
import { importLinksBenchmark } from './import-links.bench'
import type { Benchmark } from './types'

const benchmarks: Benchmark[] = [importLinksBenchmark]

const wanted = process.argv.slice(2)
const unknown = wanted.filter((name) => !benchmarks.some((bench) => bench.name === name))
if (unknown.length) {
  console.error(`Unknown benchmark ${unknown.join(', ')}; known: ${benchmarks.map((bench) => bench.name).join(', ')}.`)
  process.exit(1)
}
for (const bench of benchmarks.filter((b) => wanted.length === 0 || wanted.includes(b.name))) {
  console.log(`\n## ${bench.name}: ${bench.description}`)
  await bench.run()
}

/**
 * Runs the benchmarks: `npm run bench` for all, `npm run bench -- import-links`
 * for the named ones. Options after the names go to the benchmarks
 * (`npm run bench -- scale --links 1000000`). Benchmarks print their
 * figures; they are never tests.
 */
import 'reflect-metadata'
import { importLinksBenchmark } from './import-links.bench'
import { scaleBenchmark } from './scale.bench'
import type { Benchmark } from './types'

const benchmarks: Benchmark[] = [importLinksBenchmark, scaleBenchmark]

const args = process.argv.slice(2)
// A name is a word that is neither an option nor an option's value.
const wanted = args.filter((arg, i) => !arg.startsWith('--') && !args[i - 1]?.startsWith('--'))
const unknown = wanted.filter((name) => !benchmarks.some((bench) => bench.name === name))
if (unknown.length) {
  console.error(`Unknown benchmark ${unknown.join(', ')}; known: ${benchmarks.map((bench) => bench.name).join(', ')}.`)
  process.exit(1)
}
for (const bench of benchmarks.filter((b) => wanted.length === 0 || wanted.includes(b.name))) {
  console.log(`\n## ${bench.name}: ${bench.description}`)
  await bench.run(args)
}

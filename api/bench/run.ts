/** `npm run bench -w api`: every API benchmark in turn. They print figures; none asserts a time. */
const benches = [
  './catalogue-throughput.bench.js',
  './search.bench.js',
  './engine-api.bench.js',
  './reservations.bench.js',
];
for (const b of benches) {
  console.log(`\n== ${b.replace('./', '').replace('.bench.js', '')}`);
  await import(b);
}

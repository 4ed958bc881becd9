/** `npm run bench -- <name>`: benchmarks print figures; they are not tests and never fail on speed. */
const benches: Record<string, () => Promise<{ run: (argv: string[]) => Promise<void> }>> = {
  evaluate: () => import('./evaluate.ts'),
  sweep: () => import('./sweep.ts'),
  results: () => import('./results.ts'),
  cost: () => import('./cost.ts'),
  load: () => import('./load.ts'),
  password: () => import('./password.ts'),
  health: () => import('./health.ts'),
  'work-cost': () => import('./work-cost.ts'),
  coverage: () => import('./coverage.ts'),
  'device-sweep': () => import('./device-sweep.ts'),
  pages: () => import('./pages.ts'),
  lighthouse: () => import('./lighthouse.ts'),
  cli: () => import('./cli.ts'),
};

const [only, ...rest] = process.argv.slice(2);
const names = only ? [only] : Object.keys(benches);
for (const n of names) {
  const load = benches[n];
  if (!load) {
    process.stderr.write(`unknown bench "${n}"; choose one of ${Object.keys(benches).join(', ')}\n`);
    process.exit(2);
  }
  process.stdout.write(`\n# bench ${n}\n`);
  await (await load()).run(rest);
}

export {};

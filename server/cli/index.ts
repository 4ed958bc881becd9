/**
 * Lobewise command line: `npm run --silent cli -- <command> [options]`.
 * Each command lives in its own module and returns an exit code; usage errors exit 2 with one line.
 */
import { UsageError } from './usage-error.ts';

type Command = (argv: string[]) => Promise<number>;

// Lazy imports: `cli evaluate` must not load the database layer.
const commands: Record<string, () => Promise<Command>> = {
  evaluate: async () => (await import('./commands/evaluate.ts')).evaluateCommand,
  sweep: async () => (await import('./commands/sweep.ts')).sweepCommand,
  codes: async () => (await import('./commands/codes.ts')).codesCommand,
  coverage: async () => (await import('./commands/coverage.ts')).coverageCommand,
  migrate: async () => (await import('./commands/migrate.ts')).migrateCommand,
};

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  const load = name ? commands[name] : undefined;
  if (!load) {
    process.stderr.write(`usage: cli <${Object.keys(commands).join('|')}> [options]\n`);
    return 2;
  }
  try {
    return await (await load())(rest);
  } catch (err) {
    if (err instanceof UsageError) {
      process.stderr.write(`${err.message}\n`);
      return 2;
    }
    throw err;
  }
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stderr.write(`${err instanceof Error ? err.message : String(err)}\n`);
    process.exitCode = 1;
  },
);

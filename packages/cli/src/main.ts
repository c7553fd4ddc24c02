// The `bulkhead` command line: parses arguments, runs one command, and maps the outcome to the
// documented exit codes (0 clean, 1 findings at or above --fail-on, 2 bad input or usage).
import { parseArgs } from 'node:util';
import { UsageError } from './io.ts';
import { cliVersion } from './version.ts';
import { HELP, commandHelp } from './help.ts';
import { checkPositionals, COMMANDS, misplacedOption } from './commands/table.ts';

// A reader piping into `head` closes the pipe early; that is not an error worth a stack trace.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(0);
  throw e;
});

function run(argv: string[]): number | Promise<number> {
  const [command, ...rest] = argv;
  if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
    process.stdout.write(HELP);
    return command === undefined ? 2 : 0;
  }
  if (command === '--version' || command === '-V') {
    process.stdout.write(`bulkhead ${cliVersion()}\n`);
    return 0;
  }
  const spec = COMMANDS.get(command);
  if (!spec) throw new UsageError(`unknown command \`${command}\``);
  if (rest.includes('--help') || rest.includes('-h')) {
    process.stdout.write(commandHelp(command));
    return 0;
  }
  let parsed: ReturnType<typeof parseArgs>;
  try {
    parsed = parseArgs({ args: rest, allowPositionals: true, strict: true, options: spec.options });
  } catch (e) {
    const code = (e as { code?: string }).code;
    const raw = /'([^']+)'/.exec((e as Error).message)?.[1];
    if (code === 'ERR_PARSE_ARGS_UNKNOWN_OPTION' && raw !== undefined) throw misplacedOption(command, spec, raw);
    throw e;
  }
  checkPositionals(command, spec, parsed.positionals);
  return spec.run(parsed.values as Record<string, string | boolean | undefined>, parsed.positionals);
}

/** Commands that go on running after `run` returns (a server), so must not be ended when it does. */
const KEEPS_RUNNING: ReadonlySet<string> = new Set(['view']);

try {
  process.exitCode = await run(process.argv.slice(2));
  // Done and every byte written (pipes and files take writes at once on Linux): end now. Left to end on
  // its own, the process first lets V8 finish collecting the analysed model's heap, which can take
  // longer than a small check itself.
  const idle = process.stdout.writableLength === 0 && process.stderr.writableLength === 0;
  if (idle && !KEEPS_RUNNING.has(process.argv[2] ?? '')) process.exit();
} catch (e) {
  if (e instanceof UsageError || (e as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) {
    process.stderr.write(`bulkhead: ${(e as Error).message}\nrun \`bulkhead --help\` for the commands and options\n`);
    process.exitCode = 2;
  } else {
    process.stderr.write(
      `bulkhead: internal error: ${(e as Error).message}\nthis is a bug in Bulkhead, not in your model; set BULKHEAD_DEBUG=1 for details\n`,
    );
    if (process.env.BULKHEAD_DEBUG) process.stderr.write(String((e as Error).stack) + '\n');
    process.exitCode = 3;
  }
}

// The `bulkhead` command line: parses arguments, runs one command, and maps the outcome to the
// documented exit codes (0 clean, 1 findings at or above --fail-on, 2 bad input or usage).
import { parseArgs } from 'node:util';
import { checkCommand } from './commands/check.ts';
import { convertCommand } from './commands/convert.ts';
import { fmtCommand } from './commands/fmt.ts';
import { reportCommand } from './commands/report.ts';
import { schemaCommand } from './commands/schema.ts';
import { traceCommand } from './commands/trace.ts';
import { viewCommand } from './commands/view.ts';
import { UsageError } from './io.ts';
import { HELP, commandHelp } from './help.ts';

// A reader piping into `head` closes the pipe early; that is not an error worth a stack trace.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(0);
  throw e;
});

function run(argv: string[]): number {
  const [command, ...rest] = argv;
  if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
    process.stdout.write(HELP);
    return command === undefined ? 2 : 0;
  }
  if (command === '--version' || command === '-V') {
    process.stdout.write('bulkhead 0.1.0\n');
    return 0;
  }
  const { values, positionals } = parseArgs({
    args: rest,
    allowPositionals: true,
    strict: true,
    options: {
      help: { type: 'boolean', short: 'h' },
      check: { type: 'boolean' },
      to: { type: 'string' },
      out: { type: 'string', short: 'o' },
      format: { type: 'string' },
      date: { type: 'string' },
      'fail-on': { type: 'string' },
      'json-schema': { type: 'boolean' },
      port: { type: 'string' },
      force: { type: 'boolean' },
    },
  });
  if (values.help) {
    process.stdout.write(commandHelp(command));
    return 0;
  }
  const file = (): string => {
    const f = positionals[0];
    if (f === undefined) throw new UsageError(`\`bulkhead ${command}\` needs a model file`);
    return f;
  };
  switch (command) {
    case 'check':
      return checkCommand(file(), values['fail-on']);
    case 'trace':
      return traceCommand(file(), positionals[1]);
    case 'schema':
      return schemaCommand();
    case 'fmt':
      if (positionals.length === 0) throw new UsageError('`bulkhead fmt` needs at least one model file');
      return fmtCommand(positionals, values.check ?? false);
    case 'convert':
      return convertCommand(file(), values.to, values.out, values.force ?? false);
    case 'report':
      if (positionals.length > 1) throw new UsageError('`bulkhead report` takes one model file');
      return reportCommand(positionals[0], {
        format: values.format,
        out: values.out,
        date: values.date,
        failOn: values['fail-on'],
        jsonSchema: values['json-schema'] ?? false,
        force: values.force ?? false,
      });
    case 'view':
      return viewCommand(file(), values.port);
    default:
      throw new UsageError(`unknown command \`${command}\``);
  }
}

try {
  process.exitCode = run(process.argv.slice(2));
} catch (e) {
  if (e instanceof UsageError || (e as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) {
    process.stderr.write(`bulkhead: ${(e as Error).message}\nrun \`bulkhead --help\` for the commands and options\n`);
    process.exitCode = 2;
  } else {
    process.stderr.write(`bulkhead: internal error: ${(e as Error).message}\nthis is a bug in Bulkhead, not in your model; set BULKHEAD_DEBUG=1 for details\n`);
    if (process.env.BULKHEAD_DEBUG) process.stderr.write(String((e as Error).stack) + '\n');
    process.exitCode = 3;
  }
}

// One entry per command: the options it takes, how many files, and what it runs. Each command parses
// only its own options, so an option that belongs to another command is a usage error, never ignored.
import type { ParseArgsConfig } from 'node:util';
import { UsageError } from '../io.ts';
import { checkCommand } from './check.ts';
import { convertCommand } from './convert.ts';
import { diffCommand } from './diff.ts';
import { exportCommand } from './export.ts';
import { importCommand } from './import.ts';
import { fmtCommand } from './fmt.ts';
import { reportCommand } from './report.ts';
import { schemaCommand } from './schema.ts';
import { commonCausesCommand, cutSetsCommand } from './site-wide.ts';
import { traceCommand } from './trace.ts';
import { verifyCommand } from './verify.ts';
import { viewCommand } from './view.ts';

type Options = NonNullable<ParseArgsConfig['options']>;
type Values = Record<string, string | boolean | undefined>;

export interface CommandSpec {
  options: Options;
  /** Least and most positional arguments, and what they are called in a usage error. */
  positionals: { min: number; max: number; what: string };
  run(values: Values, positionals: string[]): number | Promise<number>;
}

const failOn = { 'fail-on': { type: 'string' } } as const satisfies Options;
const str = (v: string | boolean | undefined): string | undefined => (typeof v === 'string' ? v : undefined);

export const COMMANDS = new Map<string, CommandSpec>([
  [
    'check',
    {
      options: { ...failOn, verbose: { type: 'boolean', short: 'v' } },
      positionals: { min: 1, max: 1, what: 'a model file' },
      run: (v, [file]) => checkCommand(file!, { failOn: str(v['fail-on']), verbose: v.verbose === true }),
    },
  ],
  [
    'trace',
    {
      options: {},
      positionals: { min: 1, max: 2, what: 'a model file and a function or element tag' },
      run: (_v, [file, tag]) => traceCommand(file!, tag),
    },
  ],
  ['schema', { options: {}, positionals: { min: 0, max: 0, what: 'no file' }, run: () => schemaCommand() }],
  [
    'fmt',
    {
      options: { check: { type: 'boolean' } },
      positionals: { min: 1, max: Infinity, what: 'at least one model file' },
      run: (v, files) => fmtCommand(files, v.check === true),
    },
  ],
  [
    'convert',
    {
      options: { to: { type: 'string' }, out: { type: 'string', short: 'o' }, force: { type: 'boolean' } },
      positionals: { min: 1, max: 1, what: 'a model file' },
      run: (v, [file]) => convertCommand(file!, str(v.to), str(v.out), v.force === true),
    },
  ],
  [
    'report',
    {
      options: {
        format: { type: 'string' },
        out: { type: 'string', short: 'o' },
        date: { type: 'string' },
        'json-schema': { type: 'boolean' },
        force: { type: 'boolean' },
        contents: { type: 'string' },
        document: { type: 'string' },
        revision: { type: 'string' },
        status: { type: 'string' },
        ...failOn,
      },
      // `report --json-schema` needs no file; reportCommand says so when one is missing otherwise.
      positionals: { min: 0, max: 1, what: 'one model file' },
      run: (v, [file]) =>
        reportCommand(file, {
          format: str(v.format),
          out: str(v.out),
          date: str(v.date),
          failOn: str(v['fail-on']),
          jsonSchema: v['json-schema'] === true,
          force: v.force === true,
          contents: str(v.contents),
          document: str(v.document),
          revision: str(v.revision),
          status: str(v.status),
        }),
    },
  ],
  [
    'cut-sets',
    {
      options: { order: { type: 'string' }, format: { type: 'string' } },
      positionals: { min: 1, max: 1, what: 'a model file' },
      run: (v, [file]) => cutSetsCommand(file!, str(v.order), str(v.format)),
    },
  ],
  [
    'diff',
    {
      options: { git: { type: 'string' }, format: { type: 'string' }, ...failOn },
      positionals: { min: 1, max: 2, what: 'two model files (OLD NEW), or one with --git REV' },
      run: (v, files) => diffCommand(files, { git: str(v.git), format: str(v.format), failOn: str(v['fail-on']) }),
    },
  ],
  [
    'common-causes',
    {
      options: { format: { type: 'string' } },
      positionals: { min: 1, max: 1, what: 'a model file' },
      run: (v, [file]) => commonCausesCommand(file!, str(v.format)),
    },
  ],
  [
    'verify',
    {
      options: { format: { type: 'string' } },
      positionals: { min: 1, max: 2, what: 'a model file and optionally a SIF tag' },
      run: (v, [file, sif]) => verifyCommand(file!, sif, str(v.format)),
    },
  ],
  [
    'import',
    {
      options: {
        out: { type: 'string', short: 'o' },
        model: { type: 'string' },
        mapping: { type: 'string' },
        report: { type: 'boolean' },
        partial: { type: 'boolean' },
        force: { type: 'boolean' },
      },
      positionals: { min: 1, max: Infinity, what: 'at least one table (.csv or .xlsx)' },
      run: (v, files) =>
        importCommand(files, {
          out: str(v.out),
          model: str(v.model),
          mapping: str(v.mapping),
          report: v.report === true,
          partial: v.partial === true,
          force: v.force === true,
        }),
    },
  ],
  [
    'export',
    {
      options: { tables: { type: 'string' }, force: { type: 'boolean' } },
      positionals: { min: 1, max: 1, what: 'a model file' },
      run: (v, [file]) => exportCommand(file!, str(v.tables), v.force === true),
    },
  ],
  [
    'view',
    {
      options: { port: { type: 'string' }, compare: { type: 'string' } },
      positionals: { min: 1, max: 1, what: 'a model file' },
      run: (v, [file]) => viewCommand(file!, str(v.port), undefined, str(v.compare)),
    },
  ],
]);

/** Every option any command takes, so a misplaced one can be named with the command it belongs to. */
function ownersOf(option: string): string[] {
  return [...COMMANDS].filter(([, spec]) => Object.hasOwn(spec.options, option)).map(([name]) => name);
}

function optionList(spec: CommandSpec): string {
  const names = Object.keys(spec.options).map((o) => `--${o}`);
  return names.length ? `its options are ${names.join(', ')}` : 'it takes no options';
}

/** The usage error for an option `command` does not take, naming where it does belong. */
export function misplacedOption(command: string, spec: CommandSpec, raw: string): UsageError {
  const name = raw.replace(/^-+/, '').split('=')[0]!;
  const owners = ownersOf(name);
  const where = owners.length ? ` (it belongs to ${owners.map((o) => `\`bulkhead ${o}\``).join(', ')})` : '';
  return new UsageError(`\`bulkhead ${command}\` has no option \`${raw.split('=')[0]}\`${where}; ${optionList(spec)}`);
}

export function checkPositionals(command: string, spec: CommandSpec, positionals: string[]): void {
  const { min, max, what } = spec.positionals;
  if (positionals.length < min) throw new UsageError(`\`bulkhead ${command}\` needs ${what}`);
  if (positionals.length > max) {
    throw new UsageError(
      `\`bulkhead ${command}\` takes ${what}; found ${positionals.map((p) => `\`${p}\``).join(' ')}`,
    );
  }
}

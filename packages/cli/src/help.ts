// Help text for `bulkhead --help` and `bulkhead COMMAND --help`.

export const HELP = `bulkhead: checks that the protection layers claimed in a LOPA are independent

usage: bulkhead COMMAND [options]

commands:
  check FILE            validate a model and analyse every scenario
  schema                print the JSON Schema of the model
  fmt FILE... [--check] rewrite .bulk files in canonical form (--check: only report)
  convert FILE --to json|bulk [-o OUT]
                        convert a model between .bulk and JSON
  report FILE --format md|html|csv|json|sarif [-o OUT] [--date YYYY-MM-DD] [--fail-on LEVEL]
                        write the evidence list (report --json-schema: the JSON report's schema)

exit codes: 0 clean, 1 findings at or above --fail-on (or fmt --check found changes),
            2 bad input or usage, 3 internal error
Decision support only: it does not replace a competent LOPA team, IEC 61511, local codes or licensed practice.
`;

const COMMANDS: Record<string, string> = {
  report: `usage: bulkhead report FILE --format md|html|csv|json|sarif [-o OUT] [--date YYYY-MM-DD]
                       [--fail-on voids-credit|needs-justification|note]
       bulkhead report --json-schema

Analyses FILE and writes the evidence list: for every scenario the cause and its elements, each claimed
layer with what it relies on and its verdict, the LOPA before and after independence and the required SIL,
then every function's trace and every finding. Accepted findings stay in the report, marked accepted.

  --format     md (Markdown), html (one self-contained page, printable), csv (one row per scenario,
               layer and element), json (versioned; schema from --json-schema), sarif (SARIF 2.1.0)
  -o, --out    write to OUT instead of standard output
  --date       print this date in the header; without it the output is the same on every run
  --fail-on    exit 1 when an unaccepted finding is at or above this severity (default voids-credit)

exit codes: 0 no unaccepted finding at or above --fail-on, 1 there is one, 2 bad input or usage
`,
  check: 'usage: bulkhead check FILE\n\nLoads FILE (.bulk or .json), reports every problem with file:line:column, or summarises the model.\n',
  schema: 'usage: bulkhead schema\n\nPrints the JSON Schema (draft 2020-12) of a model. Name it in "$schema" for completion in an editor.\n',
  fmt: 'usage: bulkhead fmt FILE... [--check]\n\nRewrites each file in canonical form, keeping every comment. --check only reports files that would change (exit 1).\n',
  convert: 'usage: bulkhead convert FILE --to json|bulk [-o OUT]\n\nConverts a model between .bulk and JSON without loss (comments included).\n',
};

export function commandHelp(command: string): string {
  return COMMANDS[command] ?? HELP;
}

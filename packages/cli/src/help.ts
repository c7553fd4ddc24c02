// Help text for `bulkhead --help` and `bulkhead COMMAND --help`.

export const HELP = `bulkhead: checks that the protection layers claimed in a LOPA are independent

usage: bulkhead COMMAND [options]

commands:
  check FILE [--fail-on LEVEL]
                        validate a model, analyse every scenario: findings, LOPA, verdicts
  trace FILE TAG        what a function (or element) relies on, as a tree of paths
  schema                print the JSON Schema of the model
  fmt FILE... [--check] rewrite .bulk files in canonical form (--check: only report)
  convert FILE --to json|bulk [-o OUT [--force]]
                        convert a model between .bulk and JSON
  report FILE --format md|html|csv|json|sarif [-o OUT [--force]] [--date YYYY-MM-DD] [--fail-on LEVEL]
                        write the evidence list (report --json-schema: the JSON report's schema)
  view FILE [--port N]  show the model's graph and LOPA in a browser; follows every save
  import TABLE... -o PART.bulk [--model MAIN] [--mapping FILE] [--report] [--partial] [--force]
                        plant data from CSV/XLSX tables into a generated .bulk part file
  export FILE --tables DIR [--force]
                        a model's elements, functions and scenarios as CSV tables

exit codes: 0 clean, 1 findings at or above --fail-on (or fmt --check found changes),
            2 bad input or usage, 3 internal error
Decision support only: it does not replace a competent LOPA team, IEC 61511, local codes or licensed practice.
`;

const COMMANDS: Record<string, string> = {
  trace: `usage: bulkhead trace FILE TAG

Prints everything function (or element) TAG relies on, as a tree: each element hangs under the element
that brings it in, with the link that does (sensor, mounted-on, signal-via, powered-by, ...). Tracing stops
at process equipment. For a function it also lists each voting channel and any part the model is missing.
`,
  report: `usage: bulkhead report FILE --format md|html|csv|json|sarif [-o OUT [--force]] [--date YYYY-MM-DD]
                       [--fail-on voids-credit|needs-justification|note]
       bulkhead report --json-schema

Analyses FILE and writes the evidence list: for every scenario the cause and its elements, each claimed
layer with what it relies on and its verdict, the LOPA before and after independence and the required SIL,
then every function's trace and every finding. Accepted findings stay in the report, marked accepted.

  --format     md (Markdown), html (one self-contained page, printable), csv (one row per scenario,
               layer and element), json (versioned; schema from --json-schema), sarif (SARIF 2.1.0)
  -o, --out    write to OUT instead of standard output; never over FILE itself, and over an existing
               file only when it is a Bulkhead report (else exit 2, nothing written)
  --force      replace an existing OUT that is not a Bulkhead report
  --date       print this date in the header; without it the output is the same on every run
  --fail-on    exit 1 when an unaccepted finding is at or above this severity (default voids-credit)

exit codes: 0 no unaccepted finding at or above --fail-on, 1 there is one, 2 bad input or usage
`,
  check: `usage: bulkhead check FILE [--fail-on voids-credit|needs-justification|note]

Loads FILE (.bulk or .json). Bad input: every problem with file:line:column, exit 2. Otherwise, per
scenario: each independence finding (pointing at the claimed layer, with the path from each side to the
shared element, the rule's rationale and source, and the finding's key for an \`accept\` statement), the
LOPA as claimed, after independence and if open findings are accepted, the gap and the required SIL; then
a one-line verdict per scenario. Exit 0, or 1 with --fail-on when an unaccepted finding reaches LEVEL.
`,
  view: `usage: bulkhead view FILE [--port N]

Serves the viewer for FILE on http://127.0.0.1 (never another address) and prints the URL to open. The
page lays out each scenario's cause and claimed layers, marks shared elements, and shows the findings and
the LOPA as claimed and after independence. Every save of FILE reaches the page within a second; a save
with errors shows them and keeps the last good view. Serves only the viewer's own files and FILE.

  --port N     listen on port N (default 4780, or any free port if that one is taken; 0: any free port)

Needs the built viewer: run \`npm run build -w @bulkhead/viewer\` once (exit 2 says so if it is missing).
exit codes: 2 bad usage, file missing, viewer not built, or port taken; otherwise runs until Ctrl+C (0)
`,
  import: `usage: bulkhead import TABLE... -o PART.bulk [--model MAIN.bulk] [--mapping FILE] [--report] [--partial] [--force]

Reads CSV and XLSX tables (instrument index, I/O list, schedules, loop list, LOPA worksheet), merges rows
by tag and writes them as the .bulk part file PART, which the main model names with \`part "PART"\`.
Every problem is reported at file, sheet, row and column; with any error nothing is written.

  -o, --out    the generated file; an existing one is replaced only if import wrote it (or --force),
               and the summary lists what was added, removed or changed since
  --model      the main model: references are checked against it, and stale \`accept\` statements listed
  --mapping    a file of \`Header text = field\` lines for headers the built-in words do not know
  --report     print rows read, imported and skipped by reason, per table
  --partial    write the rows without errors, listing those left out (exit 2 all the same)

exit codes: 0 written, 2 bad input or usage (nothing written unless --partial)
`,
  export: 'usage: bulkhead export FILE --tables DIR [--force]\n\nWrites the model\'s elements, functions and scenarios as CSV tables in DIR, in the column words `bulkhead import` reads.\nSite, policy, categories, rules and accept statements stay in the model file. Existing tables are replaced only with --force.\n',
  schema: 'usage: bulkhead schema\n\nPrints the JSON Schema (draft 2020-12) of a model. Name it in "$schema" for completion in an editor.\n',
  fmt: 'usage: bulkhead fmt FILE... [--check]\n\nRewrites each file in canonical form, keeping every comment. --check only reports files that would change (exit 1).\n',
  convert: 'usage: bulkhead convert FILE --to json|bulk [-o OUT [--force]]\n\nConverts a model between .bulk and JSON without loss (comments included).\n-o never writes over FILE itself; an existing OUT is replaced only with --force (or when it already holds the same text).\n',
};

export function commandHelp(command: string): string {
  // The user's word: `constructor` is no command, whatever every object inherits.
  return Object.hasOwn(COMMANDS, command) ? COMMANDS[command]! : HELP;
}

// Help text for `bulkhead --help` and `bulkhead COMMAND --help`.

export const HELP = `bulkhead: checks that the protection layers claimed in a LOPA are independent

usage: bulkhead COMMAND [options]

commands:
  check FILE [--fail-on LEVEL] [--verbose]
                        validate a model, analyse every scenario: verdicts first, then LOPA, findings
  trace FILE TAG        what a function (or element) relies on, as a tree of paths
  verify FILE [SIF] [--format text|json]
                        a SIF's PFDavg and PFH from failure data, by subsystem, against its targets
  schema                print the JSON Schema of the model
  fmt FILE... [--check] rewrite .bulk files in canonical form (--check: only report)
  convert FILE --to json|bulk [-o OUT [--force]]
                        convert a model between .bulk and JSON
  report FILE --format md|html|csv|json|sarif [--contents evidence|worksheet|actions] [-o OUT [--force]]
         [--date YYYY-MM-DD] [--document NO] [--revision REV] [--status TEXT] [--fail-on LEVEL]
                        write the evidence list, the LOPA worksheet or the actions list
                        (report --json-schema: the JSON report's schema)
  view FILE [--port N] [--compare OLD]
                        show the model's graph and LOPA in a browser; follows every save
                        (--compare: opens comparing with an earlier revision)
  cut-sets FILE [--order N] [--format text|json]
                        per scenario, the smallest sets of elements that start it and defeat every layer
  common-causes FILE [--format text|json|csv]
                        the elements behind findings, ranked by what they cost across the site
  diff OLD NEW | diff FILE --git REV [--format text|md|json|sarif] [--fail-on worse]
                        what a revision did to independence: changes, findings, verdicts, stale justifications
  import TABLE... -o PART.bulk [--model MAIN] [--mapping FILE] [--report] [--partial] [--force]
                        plant data from CSV/XLSX tables into a generated .bulk part file
  export FILE --tables DIR [--force]
                        a model's elements, functions and scenarios as CSV tables

exit codes (check and report alike): 0 no unaccepted finding at or above --fail-on, 1 there is one
            (default level voids-credit; --fail-on none never fails on findings; fmt --check: changes),
            2 bad input or usage, 3 internal error
Decision support only: it does not replace a competent LOPA team, IEC 61511, local codes or licensed practice.
`;

const COMMANDS: Record<string, string> = {
  trace: `usage: bulkhead trace FILE TAG

Prints everything function (or element) TAG relies on, as a tree: each element hangs under the element
that brings it in, with the link that does (sensor, mounted-on, signal-via, powered-by, ...). Tracing stops
at process equipment. For a function it also lists each voting channel and any part the model is missing.
`,
  report: `usage: bulkhead report FILE --format md|html|csv|json|sarif [--contents evidence|worksheet|actions]
                       [-o OUT [--force]] [--date YYYY-MM-DD] [--document NO] [--revision REV] [--status TEXT]
                       [--fail-on voids-credit|needs-justification|note|none]
       bulkhead report --json-schema

Analyses FILE and writes the evidence list: for every scenario the cause and its elements, each claimed
layer with what it relies on and its verdict, the LOPA before and after independence and the required SIL,
then every function's trace and every finding. Accepted findings stay in the report, marked accepted.
In md, html and json it also shows the minimal cut sets up to order 2 (single points of failure first)
and the common-cause ranking, as \`bulkhead cut-sets\` and \`bulkhead common-causes\` give them.

  --format     md (Markdown), html (one self-contained page, printable), csv (one row per scenario,
               layer and element), json (versioned; schema from --json-schema), sarif (SARIF 2.1.0)
  -o, --out    write to OUT instead of standard output; never over FILE itself, and over an existing
               file only when it is a Bulkhead report (else exit 2, nothing written)
  --force      replace an existing OUT that is not a Bulkhead report
  --contents   evidence (default): the evidence list, every format, with document control, sign-off lines
               and the sources appendix; worksheet: the LOPA worksheet, one row per scenario and layer
               (md, html, csv); actions: one row per action to change or justify, with owner and due
               date columns to fill (csv)
  --document, --revision, --status
               document control printed on the report (and on every printed HTML page); each replaces
               the model's own (site ... document= revision= status=)
  --date       print this date in the header; without it the output is the same on every run
  --fail-on    exit 1 when an unaccepted finding is at or above this severity (default voids-credit;
               none: never on findings)

exit codes: 0 no unaccepted finding at or above --fail-on, 1 there is one, 2 bad input or usage
`,
  verify: `usage: bulkhead verify FILE [SIF] [--format text|json]

Computes each SIF's PFDavg (low demand) and PFH (high demand) from the failure-data and common-cause lines
of the model, subsystem by subsystem (sensors, logic solver, final elements), with the simplified equations
of IEC 61508-6:2010 Annex B. An element two channels of a voted group share (one thermowell under a 1oo2
pair) is counted as a single point in series with the group. Prints the subsystem table with each equation
and its source, the total against the claimed PFD and PFH and against the most demanding requirement of the
scenarios that credit the SIF, the hardware fault tolerance against IEC 61511-1:2016 11.4, every input with
its basis, and findings (a figure with no basis, a default used, an element with no data).

  --format     text (default) or json

exit codes: 0 every SIF verified and meeting its claim and requirement, 1 one falls short or cannot be
            verified, 2 bad input or usage
The calculation supports, and does not replace, a SIL verification by a competent person.
`,
  check: `usage: bulkhead check FILE [--fail-on voids-credit|needs-justification|note|none] [--verbose]

Loads FILE (.bulk or .json). Bad input: every problem with file:line:column, exit 2. Otherwise the answer
first: per scenario its verdict after independence, the gap (or margin) to the tolerable frequency, the SIL
its SIF needs and each layer that lost credit with the element that voided it. Then per scenario the LOPA
(as claimed, after independence, if open findings are accepted) and its findings grouped by layer, each
with the path from each side to the shared element and the key an \`accept\` statement names; a legend
gives each rule's rationale and source once, at the end.

  --fail-on    exit 1 when an unaccepted finding is at or above this severity (default voids-credit;
               none: never on findings). The same rule as \`bulkhead report\`
  -v, --verbose  list the notes too (findings that change no credit); without it they are only counted

Colour only when standard output is a terminal; none under NO_COLOR or a pipe.
exit codes: 0 no unaccepted finding at or above --fail-on, 1 there is one, 2 bad input or usage
`,
  view: `usage: bulkhead view FILE [--port N] [--compare OLD]

Serves the viewer for FILE on http://127.0.0.1 (never another address) and prints the URL to open. The
page lays out each scenario's cause and claimed layers, marks shared elements, and shows the findings and
the LOPA as claimed and after independence. Every save of FILE reaches the page within a second; a save
with errors shows them and keeps the last good view. Serves only the viewer's own files, FILE, OLD and
the part files they name.

  --port N       listen on port N (default 4780, or any free port if that one is taken; 0: any free port)
  --compare OLD  open the page comparing FILE with the earlier revision OLD, as \`bulkhead diff OLD FILE\`
                 does: each scenario's verdict change in the matrix, each changed finding marked on the
                 graph and listed. Revisions are named by the model's document and revision, else by
                 file name. Each save of FILE compares again; a save of OLD is followed too, and if it
                 stops loading the page says so and keeps the last comparison

Needs the built viewer: run \`npm run build -w @bulkhead/viewer\` once (exit 2 says so if it is missing).
exit codes: 2 bad usage, file missing, OLD does not load, viewer not built, or port taken; otherwise runs
until Ctrl+C (0)
`,
  diff: `usage: bulkhead diff OLD NEW [--format text|md|json|sarif] [--fail-on worse]
       bulkhead diff FILE --git REV [--format ...] [--fail-on worse]

What the change from OLD to NEW did to independence. First line: how many scenarios got worse and better.
Then each scenario whose verdict, mitigated frequency after independence or required SIL moved (before
and after), findings that appeared, disappeared or changed severity or acceptance (matched by key, and by
rule, parties and element where a tag was renamed), justifications the change made stale, and every
model change: > renamed, + added, - removed, ~ attribute changed. Statement order never matters.

  --git REV    read OLD from git revision REV of FILE (run in FILE's folder)
  --format     text (default), md, json, or sarif (only the findings NEW added, for code review)
  --fail-on    worse: exit 1 when a scenario got worse, an added scenario falls short, or an open
               finding (above a note) is new, more severe or no longer accepted

exit codes: 0 nothing worse (or no --fail-on), 1 worse with --fail-on worse, 2 bad input or usage
`,
  'cut-sets': `usage: bulkhead cut-sets FILE [--order N] [--format text|json]

For each scenario, every minimal set of elements whose joint failure both starts the scenario (an element
the cause relies on) and defeats every claimed layer, single points of failure first, with the path from
each side to each element and the findings about it. A MooN group is defeated when N-M+1 channels are.
Exact (MOCUS, Fussell and Vesely 1972; NUREG-0492 ch. VII), up to the order asked.

  --order N    largest set listed, 1 to 4 (default 2: single points and pairs)
  --format     text (default) or json
`,
  'common-causes': `usage: bulkhead common-causes FILE [--format text|json|csv]

Every element that takes part in an independence finding, ranked by the mitigated frequency it costs on
its own, then by the frequency at stake in the layers it touches, then by layers and scenarios. Each
affected scenario is assessed again without the element's findings; the order is printed with the list.

  --format     text (default), json or csv
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
  export:
    "usage: bulkhead export FILE --tables DIR [--force]\n\nWrites the model's elements, functions and scenarios as CSV tables in DIR, in the column words `bulkhead import` reads.\nSite, policy, categories, rules and accept statements stay in the model file. Existing tables are replaced only with --force.\n",
  schema:
    'usage: bulkhead schema\n\nPrints the JSON Schema (draft 2020-12) of a model. Name it in "$schema" for completion in an editor.\n',
  fmt: 'usage: bulkhead fmt FILE... [--check]\n\nRewrites each file in canonical form, keeping every comment. --check only reports files that would change (exit 1).\n',
  convert:
    'usage: bulkhead convert FILE --to json|bulk [-o OUT [--force]]\n\nConverts a model between .bulk and JSON without loss (comments included).\nA model split over part files comes out as one file holding them all; stderr says so and names the parts.\n-o never writes over FILE itself; an existing OUT is replaced only with --force (or when it already holds the same text).\n',
};

export function commandHelp(command: string): string {
  // The user's word: `constructor` is no command, whatever every object inherits.
  return Object.hasOwn(COMMANDS, command) ? COMMANDS[command]! : HELP;
}

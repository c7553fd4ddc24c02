// The SARIF 2.1.0 report: each finding a result at the claimed layer's line in the model file, with the
// shared element's definition as a related location, so editors and code review show findings in place.
import type * as Sarif from 'sarif';
import type { Span } from '../diagnostics/diagnostic.ts';
import { justifiedKeyOf } from '../justify/apply.ts';
import type { SeverityLevel } from '../model/schema.ts';
import type { ReportInput } from './build.ts';
import type { ReportDocument, ReportFinding } from './document.ts';
import { findingSpans, ModelLocator } from '../loader/locate.ts';
import { alikeDevices } from './alike.ts';
import { policyText } from './text.ts';

export const SARIF_SCHEMA_URI = 'https://json.schemastore.org/sarif-2.1.0.json';

export const SARIF_LEVELS: Record<SeverityLevel, Sarif.Result.level> = {
  'voids-credit': 'error',
  'needs-justification': 'warning',
  note: 'note',
};

/** The finding's stable key, under a name that says what it is and which version of keys it follows. */
export const FINGERPRINT = 'bulkheadFindingKey/v1';

/** `shared-bridle` becomes `SharedBridle`: SARIF's `name` is an identifier a person can read. */
function ruleName(id: string): string {
  return id
    .split(/[^A-Za-z0-9]+/)
    .filter(Boolean)
    .map((w) => w[0]!.toUpperCase() + w.slice(1))
    .join('');
}

function artifactUri(file: string): string {
  return encodeURI(file.replace(/\\/g, '/'));
}

function region(span: Span): Sarif.Region {
  return { startLine: span.line, startColumn: span.column, endColumn: span.column + Math.max(span.length, 1) };
}

function rules(doc: ReportDocument): Sarif.ReportingDescriptor[] {
  return doc.rules.map((r) => {
    const rationale = r.rationale ?? r.title;
    return {
      id: r.id,
      name: ruleName(r.id),
      shortDescription: { text: r.title },
      fullDescription: { text: rationale },
      help: {
        text: `${rationale} Source: ${r.source}.`,
        markdown: `${rationale}\n\n**Source:** ${r.source}`,
      },
      defaultConfiguration: { level: SARIF_LEVELS[r.defaultSeverity] },
      properties: { severity: r.severity, defaultSeverity: r.defaultSeverity, source: r.source },
    };
  });
}

class ResultBuilder {
  private readonly locator: ModelLocator;
  private readonly uri: string;
  /** Each part file's place among the run's artifacts (the main file is 0). */
  private readonly partIndex: Map<string, number>;

  constructor(input: ReportInput) {
    this.locator = new ModelLocator(input.model, input.spans);
    this.uri = artifactUri(input.file);
    this.partIndex = new Map((input.parts ?? []).map((part, i) => [part.file, i + 1]));
  }

  private artifactLocation(span: Span | undefined): Sarif.ArtifactLocation {
    if (span?.file === undefined) return { uri: this.uri, index: 0 };
    const index = this.partIndex.get(span.file);
    return { uri: artifactUri(span.file), ...(index !== undefined ? { index } : {}) };
  }

  location(span: Span | undefined, message?: string, id?: number): Sarif.Location {
    return {
      ...(id !== undefined ? { id } : {}),
      // A span in a part file of a multi-file model points at that file, listed among the artifacts.
      physicalLocation: {
        artifactLocation: this.artifactLocation(span),
        ...(span ? { region: region(span) } : {}),
      },
      ...(message ? { message: { text: message } } : {}),
    };
  }

  /**
   * For findings about justifications, the `accept` statement; else where the finding itself points (the
   * claimed layer, the enabler or modifier, the cause: loader/locate.ts, as the text notice does); else the
   * scenario.
   */
  private primary(f: ReportFinding): Span | undefined {
    const justified = justifiedKeyOf(f);
    if (justified !== undefined) return this.locator.justification(justified);
    const { span } = findingSpans(f, this.locator);
    if (span) return span;
    return f.scenario !== undefined ? this.locator.scenario(f.scenario) : undefined;
  }

  private related(f: ReportFinding): Sarif.Location[] {
    const out: Sarif.Location[] = [];
    let id = 1;
    const alike = alikeDevices(f);
    if (alike)
      for (const tag of alike)
        out.push(
          this.location(this.locator.element(tag), `\`${tag}\`, of the same make and model, is defined here`, id++),
        );
    else if (f.element !== undefined)
      out.push(this.location(this.locator.element(f.element), `shared element \`${f.element}\` is defined here`, id++));
    // The layer the primary location names (the last claimed one, as in findingSpans) is not repeated here.
    const primaryLayer = f.parties.map((p) => p.role === 'layer' && p.tag !== undefined).lastIndexOf(true);
    f.parties.forEach((p, i) => {
      if (i === primaryLayer) return;
      const path = f.paths[i];
      const via = path && path.length > 0 ? ` (${path.join(' -> ')})` : '';
      if (p.role === 'cause' && f.scenario !== undefined) {
        out.push(
          this.location(this.locator.cause(f.scenario), `the initiating cause of \`${f.scenario}\`${via}`, id++),
        );
      } else if (p.role === 'layer' && p.tag !== undefined) {
        out.push(this.location(this.locator.layer(f.scenario, p.tag), `the other layer \`${p.tag}\`${via}`, id++));
      }
    });
    return out;
  }

  private message(f: ReportFinding): string {
    const paths = f.parties
      .map((p, i) => {
        const path = f.paths[i];
        if (!path || path.length === 0) return undefined;
        return `${p.role === 'cause' ? 'from the cause' : `from \`${p.tag ?? 'the layer'}\``}: ${path.join(' -> ')}`;
      })
      .filter((x) => x !== undefined);
    return `${f.message}${paths.length ? `. Paths ${paths.join('; ')}` : ''}. Key: \`${f.key}\``;
  }

  result(f: ReportFinding, ruleIndex: number): Sarif.Result {
    const related = this.related(f);
    const accepted = f.accepted;
    return {
      ruleId: f.rule,
      ...(ruleIndex >= 0 ? { ruleIndex } : {}),
      level: SARIF_LEVELS[f.severity],
      message: { text: this.message(f) },
      locations: [this.location(this.primary(f))],
      ...(related.length ? { relatedLocations: related } : {}),
      partialFingerprints: { [FINGERPRINT]: f.key },
      // An accepted finding stays a result: SARIF readers show it as suppressed with its justification.
      ...(accepted
        ? {
            suppressions: [
              {
                kind: 'inSource' as const,
                status: 'accepted' as const,
                justification: `accepted by ${accepted.by} on ${accepted.date}: ${accepted.reason}`,
                location: this.location(this.locator.justification(f.key)),
              },
            ],
          }
        : {}),
      properties: {
        key: f.key,
        severity: f.severity,
        ...(f.scenario !== undefined ? { scenario: f.scenario } : {}),
        ...(alikeDevices(f)
          ? { sameMakeModel: alikeDevices(f) }
          : f.element !== undefined
            ? { sharedElement: f.element }
            : {}),
        rationale: f.rationale,
        source: f.source,
      },
    };
  }
}

export function renderSarif(doc: ReportDocument, input: ReportInput): string {
  const builder = new ResultBuilder(input);
  const ruleIds = doc.rules.map((r) => r.id);
  const overrides = doc.rules
    .map((r, index) => ({ r, index }))
    .filter(({ r }) => r.severity !== r.defaultSeverity)
    .map(({ r, index }) => ({
      descriptor: { id: r.id, index },
      configuration: { level: SARIF_LEVELS[r.severity] },
      ...(r.reason ? { properties: { reason: r.reason } } : {}),
    }));
  const log: Sarif.Log = {
    $schema: SARIF_SCHEMA_URI,
    version: '2.1.0',
    runs: [
      {
        tool: {
          driver: {
            name: 'bulkhead',
            version: doc.tool.version,
            semanticVersion: doc.tool.version,
            rules: rules(doc),
          },
        },
        invocations: [
          {
            executionSuccessful: true,
            ...(overrides.length ? { ruleConfigurationOverrides: overrides } : {}),
          },
        ],
        artifacts: [
          // The model file's own hash: with parts, doc.model.sha256 covers them all.
          { location: { uri: artifactUri(doc.model.file) }, hashes: { 'sha-256': input.sha256 } },
          ...(input.parts ?? []).map((part) => ({
            location: { uri: artifactUri(part.file) },
            hashes: { 'sha-256': part.sha256 },
          })),
        ],
        columnKind: 'utf16CodeUnits',
        results: doc.findings.map((f) => builder.result(f, ruleIds.indexOf(f.rule))),
        properties: {
          site: doc.site.name,
          reportFormatVersion: doc.formatVersion,
          ...(doc.date ? { date: doc.date } : {}),
          policy: policyText(doc),
          cautions: doc.cautions,
        },
      },
    ],
  };
  return `${JSON.stringify(log, null, 2)}\n`;
}

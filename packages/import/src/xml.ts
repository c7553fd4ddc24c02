// A small element tree from a streaming XML parser (saxes), each element with the line and column of
// its start tag, so whatever is found wrong later can be reported at file:line:column. Drawing-only
// subtrees (the shape catalogue) are not kept.
import { SaxesParser } from 'saxes';
import { issue, type ImportIssue } from './issues.ts';

export interface XmlElement {
  name: string;
  attributes: Record<string, string>;
  line: number;
  column: number;
  children: XmlElement[];
  parent?: XmlElement;
}

const SKIPPED = new Set(['ShapeCatalogue']);

export function readXml(file: string, text: string, issues: ImportIssue[]): XmlElement | undefined {
  const parser = new SaxesParser({ position: true });
  const root: XmlElement = { name: '#document', attributes: {}, line: 1, column: 1, children: [] };
  let current = root;
  let skipping = 0;
  let start = { line: 1, column: 1 };
  let failed = false;
  parser.on('opentagstart', (tag) => {
    // The parser stands just past `<name`: the tag starts that many characters before.
    start = { line: parser.line, column: Math.max(1, parser.column - tag.name.length - 1) };
  });
  parser.on('opentag', (tag) => {
    if (skipping > 0 || SKIPPED.has(tag.name)) {
      if (!tag.isSelfClosing) skipping++;
      return;
    }
    const element: XmlElement = {
      name: tag.name,
      attributes: tag.attributes as Record<string, string>,
      line: start.line,
      column: start.column,
      children: [],
      parent: current,
    };
    current.children.push(element);
    if (!tag.isSelfClosing) current = element;
  });
  parser.on('closetag', (tag) => {
    if (skipping > 0) {
      if (!tag.isSelfClosing) skipping--;
      return;
    }
    if (!tag.isSelfClosing && current.parent) current = current.parent;
  });
  parser.on('error', (e) => {
    if (failed) return;
    failed = true;
    issues.push(
      issue(
        'BH511',
        `the XML is malformed: ${e.message.replace(/^[^:]*:\d+:\d+: /, '')}`,
        { file, line: parser.line, lineColumn: parser.column + 1 },
        {
          help: 'export the P&ID again as DEXPI (Proteus XML); the file must be well-formed XML',
        },
      ),
    );
  });
  try {
    parser.write(text.replace(/^\uFEFF/, '')).close();
  } catch {
    // reported by the error handler
  }
  return failed ? undefined : root;
}

/** Every element below `node` (depth first), optionally only those with one name. */
export function descendants(node: XmlElement, name?: string): XmlElement[] {
  const out: XmlElement[] = [];
  const walk = (n: XmlElement) => {
    for (const c of n.children) {
      if (name === undefined || c.name === name) out.push(c);
      walk(c);
    }
  };
  walk(node);
  return out;
}

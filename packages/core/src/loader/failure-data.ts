// Checks on failure data and common-cause factors beyond the schema: what each row is for, the form its
// rates take, numbers in range, and rows given twice. Each problem points at the narrowest span we have.
import type { Diagnostic, DiagnosticCode } from '../diagnostics/diagnostic.ts';
import type { FailureData, Model } from '../model/schema.ts';

type Push = (code: DiagnosticCode, message: string, path: string, extra?: Partial<Diagnostic>) => void;

/** Whether a number is a fraction in [0, 1]. */
function isFraction(value: number): boolean {
  return Number.isFinite(value) && value >= 0 && value <= 1;
}

function checkRow(
  model: Model,
  row: FailureData,
  at: (field: string) => string,
  push: Push,
  tags: Map<string, string>,
): void {
  const byElement = row.element !== undefined;
  const byMakeModel = row.make !== undefined || row.model !== undefined;
  if (byElement === byMakeModel || (byMakeModel && (row.make === undefined || row.model === undefined))) {
    push('BH340', `failure data \`${row.id}\` must name one element, or one make and model`, at('id'), {
      help: 'write element=TAG for one element, or make="..." model="..." for every element of that make and model',
    });
  }
  if (row.element !== undefined && !tags.has(row.element)) {
    push('BH300', `unknown tag \`${row.element}\` in \`element\``, at('element'));
  }
  if (byMakeModel && row.make !== undefined && row.model !== undefined) {
    const matched = model.elements.some(
      (e) => 'make' in e && e.make === row.make && 'model' in e && e.model === row.model,
    );
    if (!matched)
      push('BH340', `no element is of make "${row.make}" and model "${row.model}"`, at('model'), {
        help: "the make and model must match an element's make= and model= exactly",
      });
  }
  const splitForm = row.lambdaDu !== undefined || row.lambdaDd !== undefined;
  const coverageForm = row.lambdaD !== undefined || row.dc !== undefined;
  if (splitForm === coverageForm) {
    push(
      'BH341',
      splitForm
        ? `failure data \`${row.id}\` gives its rates in both forms`
        : `failure data \`${row.id}\` gives no dangerous failure rate`,
      at('id'),
      {
        help: 'give lambda-du= and lambda-dd= (per hour), or lambda-d= (per hour) with dc= (diagnostic coverage, 0 to 1)',
      },
    );
  } else if (splitForm && row.lambdaDu === undefined) {
    push('BH341', `failure data \`${row.id}\` gives lambda-dd but no lambda-du`, at('lambdaDd'), {
      help: 'the undetected rate drives the PFD: give lambda-du= (0 if none)',
    });
  } else if (splitForm && row.lambdaDd === undefined) {
    push('BH341', `failure data \`${row.id}\` gives lambda-du but no lambda-dd`, at('lambdaDu'), {
      help: 'give lambda-dd= (0 if the device has no diagnostics)',
    });
  } else if (coverageForm && (row.lambdaD === undefined || row.dc === undefined)) {
    push(
      'BH341',
      `failure data \`${row.id}\` needs both lambda-d and dc`,
      at(row.lambdaD === undefined ? 'dc' : 'lambdaD'),
    );
  }
  for (const field of ['lambdaDu', 'lambdaDd', 'lambdaD', 'lambdaSd'] as const) {
    const value = row[field];
    if (value !== undefined && !(Number.isFinite(value) && value >= 0 && value < 1)) {
      push('BH342', `failure rate ${value} per hour is out of range`, at(field), {
        help: 'failure rates are per hour: at least 0, and well below 1 (1e-6 is one failure in a million hours)',
      });
    }
  }
  for (const field of ['dc', 'proofTestCoverage'] as const) {
    const value = row[field];
    if (value !== undefined && !isFraction(value))
      push(
        'BH342',
        `${field === 'dc' ? 'diagnostic coverage' : 'proof-test coverage'} ${value} is outside [0, 1]`,
        at(field),
        { help: 'write 90% as 0.9' },
      );
  }
  for (const field of ['proofTestHours', 'missionHours', 'mttrHours'] as const) {
    const value = row[field];
    if (value !== undefined && !(Number.isFinite(value) && value > 0))
      push('BH342', `${value} hours must be positive and finite`, at(field), { help: 'a year is 8,760 hours' });
  }
  if (row.hft !== undefined && !(Number.isInteger(row.hft) && row.hft >= 0 && row.hft <= 2)) {
    push('BH342', `hardware fault tolerance ${row.hft} is not 0, 1 or 2`, at('hft'));
  }
  if (row.proofTestCoverage !== undefined && row.proofTestCoverage < 1 && row.missionHours === undefined) {
    push(
      'BH344',
      `proof-test coverage ${row.proofTestCoverage} leaves failures hidden, but \`${row.id}\` gives no mission time`,
      at('proofTestCoverage'),
      {
        help: 'give mission-hours= (how long the device stays in service, or the interval of a full overhaul)',
      },
    );
  }
}

/** Checks the failure-data rows and common-cause factors of a model that passed the schema. */
export function checkFailureData(model: Model, push: Push): void {
  const tags = new Map(model.elements.map((e) => [e.tag, e.kind]));
  const seen = new Map<string, number>();
  (model.failureData ?? []).forEach((row, i) => {
    const at = (field: string) => `failureData.${i}.${field}`;
    checkRow(model, row, at, push, tags);
    const key = row.element !== undefined ? `element ${row.element}` : `make "${row.make}" model "${row.model}"`;
    const first = seen.get(key);
    if (first !== undefined) {
      push(
        'BH343',
        `failure data for ${key} is given twice (\`${model.failureData![first]!.id}\` and \`${row.id}\`)`,
        at('id'),
        { help: 'keep one row; a row for an element already wins over its make and model' },
      );
    } else seen.set(key, i);
  });
  const functions = new Map(model.functions.map((f) => [f.tag, f]));
  const groups = new Set<string>();
  (model.commonCauses ?? []).forEach((cc, i) => {
    const at = (field: string) => `commonCauses.${i}.${field}`;
    const fn = functions.get(cc.function);
    if (fn === undefined) push('BH300', `unknown function \`${cc.function}\` in \`common-cause\``, at('function'));
    else if (fn.kind !== 'sif')
      push(
        'BH345',
        `\`${cc.function}\` is a ${fn.kind} function; common-cause factors are for a SIF's voted groups`,
        at('function'),
      );
    else if (cc.group === 'solver') {
      push('BH345', `the logic solver of \`${cc.function}\` is one element here, not a voted group`, at('group'), {
        help: "give a redundant logic solver's hft= and failure figures (from its safety manual) on its failure-data line",
      });
    } else if ((cc.group === 'sensors' ? fn.sensors : fn.finals).length < 2) {
      push(
        'BH345',
        `\`${cc.function}\` has one ${cc.group === 'sensors' ? 'sensor' : 'final element'}: there is no voted group to share a common cause`,
        at('group'),
      );
    }
    for (const field of ['beta', 'betaD'] as const) {
      const value = cc[field];
      if (value !== undefined && !(Number.isFinite(value) && value >= 0 && value < 1))
        push('BH342', `common-cause factor ${value} is outside [0, 1)`, at(field), { help: 'write 5% as 0.05' });
    }
    const key = `${cc.function} ${cc.group}`;
    if (groups.has(key))
      push('BH343', `common-cause factors for the ${cc.group} of \`${cc.function}\` are given twice`, at('group'));
    groups.add(key);
  });
}

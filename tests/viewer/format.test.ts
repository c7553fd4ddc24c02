// The viewer's sentence case for reasons the server gives in lower case (apps/viewer/src/lib/format.ts).
// English sentence case, a capital first letter and a closing full stop: common practice, no source.
import { describe, expect, it } from 'vitest';
import { asSentence } from '../../apps/viewer/src/lib/format.ts';

describe('asSentence', () => {
  it.each([
    // The reasons `bulkhead view` sends for a file it cannot read (packages/cli/src/view/site-files.ts).
    ['the file is missing (deleted or renamed)', 'The file is missing (deleted or renamed).'],
    ['the path is now a directory, not a file', 'The path is now a directory, not a file.'],
    ['the file is 51.0 MB; the limit is 50 MB', 'The file is 51.0 MB; the limit is 50 MB.'],
    // Already a sentence: left as it is.
    ['The server answered 500.', 'The server answered 500.'],
    ['  padded reason  ', 'Padded reason.'],
    ['', ''],
  ])('%j reads %j', (reason, sentence) => {
    expect(asSentence(reason)).toBe(sentence);
  });
});

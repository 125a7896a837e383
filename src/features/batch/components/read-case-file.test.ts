import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { onsetCaseInputFields, onsetCaseResultFields } from '../../../../shared/schemas/onset';
import { resultsToCsv } from './batch-results';
import { readCaseFile } from './read-case-file';

const fixtures = join(__dirname, '../../../../tests/fixtures/onset');

describe('readCaseFile', () => {
  it('reads the onset command’s CSV fixture: one case per data row, header fields as keys', () => {
    const text = readFileSync(join(fixtures, 'cases.csv'), 'utf8');
    const dataRows = text.split(/\r?\n/).filter((line) => line.trim() !== '').length - 1;
    const file = readCaseFile('cases.csv', text);
    expect(file.format).toBe('csv');
    expect(file.cases).toHaveLength(dataRows);
    expect(Object.keys(file.cases[0]!)).toEqual([...onsetCaseInputFields]);
    expect(file.where[0]).toBe('row 1 (line 2)');
  });

  it('reads the JSON fixture as an array of cases', () => {
    const text = readFileSync(join(fixtures, 'cases.json'), 'utf8');
    const file = readCaseFile('cases.json', text);
    expect(file.format).toBe('json');
    expect(file.cases).toHaveLength((JSON.parse(text) as unknown[]).length);
  });

  it('names what is wrong with a file that is not a list of cases', () => {
    expect(() => readCaseFile('x.json', '{"id": 1')).toThrow(/not valid JSON/);
    expect(() => readCaseFile('x.json', '{"id": 1}')).toThrow(/expected a JSON array of cases/);
    expect(() => readCaseFile('x.json', '[1, 2]')).toThrow(/element 1 is not an object/);
  });
});

describe('resultsToCsv', () => {
  it('writes the onset command’s output columns in order, blanks for null', () => {
    const row = Object.fromEntries(onsetCaseResultFields.map((field) => [field, null])) as never as Parameters<typeof resultsToCsv>[0][number];
    const csv = resultsToCsv([{ ...row, id: 'a', margin: 1.5 }]);
    const [header, line] = csv.split(/\r?\n/);
    expect(header).toBe(onsetCaseResultFields.join(','));
    expect(line!.split(',')[onsetCaseResultFields.indexOf('margin')]).toBe('1.5');
    expect(line!.split(',')[onsetCaseResultFields.indexOf('rayleigh')]).toBe('');
  });
});

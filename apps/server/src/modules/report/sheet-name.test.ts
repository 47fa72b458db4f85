import { describe, expect, it } from 'vitest';
import { SHEET_NAME_MAX, sheetNameUnique } from './sheet-name.js';

// Worksheet name rules as Excel enforces them: ≤ 31 characters, none of [ ] : * ? / \, no leading
// or trailing apostrophe, unique without regard to case, "History" reserved [CP].
describe('sheetNameUnique', () => {
  it('replaces the characters Excel forbids', () => {
    expect(sheetNameUnique('a[b]c:d*e?f/g\\h', new Set())).toBe('a b c d e f g h');
  });

  it('cuts long names to 31 characters', () => {
    const name = sheetNameUnique('1 The very long candidate site on Harbour Row', new Set());
    expect(name).toBe('1 The very long candidate site');
    expect(name.length).toBeLessThanOrEqual(SHEET_NAME_MAX);
  });

  it('adds a numbered suffix when the name is taken, ignoring case, and stays within 31 characters', () => {
    const used = new Set<string>();
    expect(sheetNameUnique('Summary', used)).toBe('Summary');
    expect(sheetNameUnique('SUMMARY', used)).toBe('SUMMARY (2)');
    const long = 'x'.repeat(40);
    expect(sheetNameUnique(long, used)).toBe('x'.repeat(31));
    const second = sheetNameUnique(long, used);
    expect(second).toBe(`${'x'.repeat(27)} (2)`);
    expect(second.length).toBe(31);
  });

  it('drops edge apostrophes, avoids "History" and names an empty result', () => {
    expect(sheetNameUnique("'quoted'", new Set())).toBe('quoted');
    expect(sheetNameUnique('history', new Set())).toBe('History (site)');
    expect(sheetNameUnique('???', new Set())).toBe('Sheet');
  });

  it('never splits a character outside the basic plane', () => {
    expect(sheetNameUnique(`${'a'.repeat(29)}🥐🥐`, new Set())).toBe(`${'a'.repeat(29)}🥐`);
    expect(sheetNameUnique(`${'a'.repeat(30)}🥐`, new Set())).toBe('a'.repeat(30));
  });
});

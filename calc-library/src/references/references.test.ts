import { describe, expect, it } from 'vitest';
import { calculators } from '../run-calculator.js';
import { isReferenceKey, references } from './bibliography.js';
import { renderReferencesMarkdown } from './render-references-markdown.js';
import written from '../../REFERENCES.md?raw';

describe('the bibliography', () => {
  it('has unique AuthorYear keys in order and a DOI or address where one exists', () => {
    const keys = references.map((reference) => reference.key);
    expect(new Set(keys).size).toBe(keys.length);
    expect([...keys].sort()).toEqual(keys);
    for (const reference of references) {
      expect(reference.key).toMatch(/^[A-Z][A-Za-z]+\d{4}$/);
      if (reference.doi !== undefined) expect(reference.doi).toMatch(/^10\.\d{4,}\//);
    }
  });

  it('is written out in REFERENCES.md', () => {
    expect(written).toBe(renderReferencesMarkdown(references));
  });

  it('holds every key that calculators cite', () => {
    for (const calculator of calculators) {
      for (const key of calculator.references) expect(isReferenceKey(key), key).toBe(true);
      for (const input of calculator.inputs) {
        if (input.source !== undefined)
          expect(isReferenceKey(input.source), input.source).toBe(true);
      }
    }
  });
});

import { describe, expect, it } from 'vitest';
import { defaultsFor, suggestedName, toTemplateSpec } from './templates';

describe('the template form', () => {
  it('starts with the lens space L(5,2) and names it so', () => {
    const f = defaultsFor('lens');
    expect(toTemplateSpec(f).spec).toEqual({ kind: 'lens', p: 5, q: 2 });
    expect(suggestedName(f)).toBe('L(5,2)');
  });

  it('asks for coprime p and q (a (p,q) curve on the torus is simple iff gcd(p,q) = 1; Farb–Margalit 2012, §1.2)', () => {
    const r = toTemplateSpec({ ...defaultsFor('lens'), p: '6', q: '4' });
    expect(r.spec).toBeUndefined();
    expect(r.errors.q).toMatch(/coprime/);
  });

  it('rejects text where a number belongs, with a message for that field', () => {
    expect(toTemplateSpec({ ...defaultsFor('s3'), genus: 'two' }).errors.genus).toMatch(/whole number/);
    expect(toTemplateSpec({ ...defaultsFor('s1xs2'), genus: '9' }).errors.genus).toMatch(/between 1 and 6/);
  });

  it('accepts the trefoil grid of Manolescu–Ozsváth–Sarkar 2009 (REFERENCE.md) as its default', () => {
    expect(toTemplateSpec(defaultsFor('grid')).spec).toEqual({ kind: 'grid', x: [1, 2, 3, 4, 0], o: [4, 0, 1, 2, 3] });
  });

  it('requires X and O to be permutations with one marking per square (MOS09: one X and one O in each row and column)', () => {
    expect(toTemplateSpec({ ...defaultsFor('grid'), x: '0, 0, 1' }).errors.x).toMatch(/permutation/);
    expect(toTemplateSpec({ ...defaultsFor('grid'), x: '0, 1', o: '0, 1' }).errors.o).toMatch(/same row/);
    expect(toTemplateSpec({ ...defaultsFor('grid'), x: '0, 1', o: '1, 2, 0' }).errors.o).toMatch(/same number/);
  });
});

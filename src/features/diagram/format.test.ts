import { describe, expect, it } from 'vitest';
import { parsePointList } from './format';

describe('typed generators in the Domains panel', () => {
  it('reads x1, x₄ and bare numbers as 0-based intersection points', () => {
    expect(parsePointList('x1, x₄', 5)).toEqual([0, 3]);
    expect(parsePointList(' 2 3 ', 5)).toEqual([1, 2]);
    expect(parsePointList('{x_1}', 5)).toEqual([0]);
  });

  it('treats an empty field as "let the boundary decide"', () => {
    expect(parsePointList('   ', 5)).toBeUndefined();
  });

  it('explains a name that is not an intersection point of the diagram', () => {
    expect(parsePointList('x9', 5)).toBe('“x9” is not an intersection point here (x1 … x5).');
    expect(parsePointList('alpha', 5)).toMatch(/not an intersection point/);
  });
});

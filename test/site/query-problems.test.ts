// The finder's messages about a bad query (site/scripts/finder/query-problems.ts).
import { describe, expect, it } from 'vitest';
import { FINDER_FIELDS } from '../../catalog-db/orbit-fields.ts';
import { queryProblems } from '../../site/scripts/finder/query-problems.ts';

const range = FINDER_FIELDS.find((f) => f.filter?.kind === 'range' && f.filter.minKey !== undefined && f.filter.maxKey !== undefined)!;
const spec = range.filter as { minKey: string; maxKey: string };

describe('queryProblems', () => {
  it('says nothing about a good query or an empty one', () => {
    expect(queryProblems('')).toEqual([]);
    expect(queryProblems(`${spec.minKey}=1&${spec.maxKey}=2`)).toEqual([]);
    expect(queryProblems(`${spec.minKey}=2&${spec.maxKey}=2`)).toEqual([]);
  });

  it('names a value that is not a number and says it is ignored', () => {
    const [problem, ...rest] = queryProblems(`${spec.minKey}=abc`);
    expect(rest).toEqual([]);
    expect(problem).toContain('“abc” is not a number');
    expect(problem).toContain('ignored');
  });

  it('says that a minimum above the maximum matches no orbit', () => {
    const problems = queryProblems(`${spec.minKey}=5&${spec.maxKey}=1`);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/minimum 5 is above the maximum 1, so no orbit can match/);
  });
});

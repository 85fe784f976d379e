// The per-version evaluation cache gives exactly the report evaluate() gives, for both demos, and never a report of
// other content under the same id and version.
import { describe, expect, it } from 'vitest';
import { DEMO_PROJECTS } from '../../../seed-demo/index';
import { evaluate } from '../../../src/core/evaluate';
import { ReportCache } from '../../../src/web/cache/reports';

describe('ReportCache', () => {
  for (const demo of DEMO_PROJECTS) {
    it(`cached and uncached reports are identical: ${demo.name}`, () => {
      const cache = new ReportCache();
      const first = cache.report(demo);
      const second = cache.report(structuredClone(demo));
      expect(cache.misses).toBe(1);
      expect(cache.hits).toBe(1);
      expect(second).toBe(first);
      expect(second).toEqual(evaluate(structuredClone(demo)));
    });
  }

  it('a project with the same id and version but other content is evaluated again, not served the old report', () => {
    const cache = new ReportCache();
    const demo = DEMO_PROJECTS[0];
    const before = cache.report(demo);
    const other = { ...structuredClone(demo), targetPowerW: demo.targetPowerW / 2 };
    const after = cache.report(other);
    expect(cache.misses).toBe(2);
    expect(after).not.toBe(before);
    expect(after).toEqual(evaluate(other));
  });

  it('holds no more reports than its entry limit', () => {
    const cache = new ReportCache({ maxEntries: 2, maxBytes: 1e9 });
    const demo = DEMO_PROJECTS[1];
    for (let v = 1; v <= 5; v++) cache.report({ ...demo, version: v });
    expect(cache.size).toBe(2);
    expect(cache.peek({ ...demo, version: 1 })).toBeUndefined();
    expect(cache.peek({ ...demo, version: 5 })).toBeDefined();
  });
});

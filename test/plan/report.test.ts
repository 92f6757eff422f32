import { describe, expect, it } from 'vitest';
import { CAUTIONS } from '../../generator/doc/cautions.ts';
import { planHtml, planMarkdown, planReport } from '../../generator/plan/report.ts';
import { planOf, row } from './helpers.ts';

// The report's figures are the plan's own; checked here: every caution (the shared project text,
// common practice for low-pressure gravity feed), the starving mark, and HTML escaping (source:
// WHATWG HTML, character references).

describe('plan report', () => {
  const plan = planOf({
    name: 'Tubs <east>',
    tank: { fullSurfaceElevation: '2 m' },
    main: { innerDiameter: '5 mm' },
    containers: [row('near & low', '0.3 m', { count: 6, mainLength: '1 m' }), row('far', '1 m', { mainLength: '15 m' })],
  });
  const report = planReport(plan, { d1: ['d1-near-low/d1-housing.stl'] });

  it('has one row per container with head range, levels, flows, sizes, plastic, ballast and warnings', () => {
    expect(report.containers.rows).toHaveLength(2);
    expect(report.containers.headers).toHaveLength(report.containers.rows[0]!.length);
    const far = report.containers.rows[1]!;
    expect(far[0]).toBe('far (!)');
    expect(far[12]).toMatch(/^STARVES/);
    expect(report.starving).toEqual([expect.stringMatching(/^far: gets (no water|\d+ % of its own flow) with every valve open/)]);
    expect(report.designs.rows[0]![4]).toBe('d1-near-low/d1-housing.stl');
  });

  it('shows every caution in Markdown and HTML, and escapes names in HTML', () => {
    const md = planMarkdown(report);
    const html = planHtml(report);
    for (const c of CAUTIONS) {
      expect(md).toContain(c.text);
      expect(html).toContain(c.title);
    }
    expect(html).toContain('Tubs &lt;east&gt;');
    expect(html).toContain('near &amp; low');
    expect(html).toContain('<tr class="starving"><td>far (!)</td>');
    expect(md).toContain('| far (!) |');
  });
});

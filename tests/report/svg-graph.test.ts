import { describe, expect, test } from 'vitest';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { graphToSvg, drawingPositions } from '../../src/report/svg-graph.js';
import { scorePlotSvg, niceTicks } from '../../src/report/svg-plot.js';
import { layoutGraph } from '../../src/report/layout.js';
import * as F from '../../src/graph/families.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { edgeList } from '../../src/graph/graph.js';
import { randomGraph, seededRng } from '../support/random-graph.js';

const parser = new XMLParser({
  ignoreAttributes: false,
  isArray: (_name, _path, _leaf, isAttribute) => !isAttribute,
});

function marks(svg: string): { circles: number; lines: number } {
  const doc = parser.parse(svg);
  const groups = doc.svg[0].g as Array<Record<string, unknown>>;
  const edges = groups.find((x) => x['@_class'] === 'edges') as { line?: unknown[] };
  const vertices = groups.find((x) => x['@_class'] === 'vertices') as { circle?: unknown[] };
  return { circles: vertices.circle?.length ?? 0, lines: edges.line?.length ?? 0 };
}

describe('graphToSvg()', () => {
  // Well-formedness by an independent XML parser (fast-xml-parser's validator).
  const graphs = [
    F.petersen(),
    F.broom(4, 3),
    F.emptyGraph(1),
    F.completeBipartite(3, 4),
    decodeGraph6('DQc'),
  ];
  for (const g of graphs) {
    test(`graphToSvg() is well-formed XML with one disc per vertex and one line per edge (n=${g.order}, m=${g.size})`, () => {
      const svg = graphToSvg(g, { colourBy: 'degree', caption: ['score < 0 & "quoted"'] });
      expect(XMLValidator.validate(svg)).toBe(true);
      expect(marks(svg)).toEqual({ circles: g.order, lines: edgeList(g).length });
    });
  }
  test('graphToSvg() gives the same bytes for the same seed and moves vertices for another seed', () => {
    const g = randomGraph(14, 0.3, seededRng('svg'));
    expect(graphToSvg(g, { seed: 'a' })).toBe(graphToSvg(g, { seed: 'a' }));
    expect(graphToSvg(g, { seed: 'a', layout: 'force' })).not.toBe(
      graphToSvg(g, { seed: 'b', layout: 'force' }),
    );
  });
  test('the caption carries graph6, n and m', () => {
    expect(graphToSvg(F.petersen())).toContain('IheA@GUAo   n = 10, m = 15');
  });
});

describe('layouts', () => {
  test('the tree layout puts every child one layer below its parent', () => {
    const g = F.broom(5, 4);
    const p = layoutGraph(g, 'tree');
    const ys = [...new Set(p.map((q) => q.y))].sort((a, b) => a - b);
    // A broom on path 0..4 with leaves on 4, hung from its centre 2: layers {2}, {1,3}, {0,4}, {5..8}.
    expect(ys.length).toBe(4);
    for (const [u, v] of edgeList(g)) expect(Math.abs(ys.indexOf(p[u].y) - ys.indexOf(p[v].y))).toBe(1);
  });
  test('the force layout separates the vertices of K_8 (no two closer than a tenth of the side)', () => {
    const p = drawingPositions(F.complete(8), { layout: 'force' });
    for (let i = 0; i < 8; i++)
      for (let j = i + 1; j < 8; j++)
        expect(Math.hypot(p[i].x - p[j].x, p[i].y - p[j].y)).toBeGreaterThan(31);
  });
  test('the circular layout spaces vertices evenly', () => {
    const p = layoutGraph(F.cycle(4), 'circle');
    expect(p[0].x).toBeCloseTo(0.5, 12);
    expect(p[0].y).toBeCloseTo(0, 12);
    expect(p[2].y).toBeCloseTo(1, 12);
  });
});

describe('scorePlotSvg()', () => {
  test('niceTicks() steps by 1, 2 or 5 times a power of ten', () => {
    expect(niceTicks(0, 10, 5)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(niceTicks(-0.3, 0.2, 5)).toEqual(
      [-0.3, -0.2, -0.1, 0, 0.1, 0.2].map((x) => expect.closeTo(x, 12)),
    );
  });
  test('scorePlotSvg() is well-formed with one polyline per non-empty series', () => {
    const svg = scorePlotSvg(
      [
        {
          label: 'best',
          colour: '#1f77b4',
          points: [
            [0, -3],
            [1, -2],
            [2, 0.5],
          ],
        },
        {
          label: 'elite mean',
          colour: '#ff7f0e',
          points: [
            [0, -5],
            [1, -4],
            [2, -1],
          ],
        },
        { label: 'empty', colour: '#000000', points: [] },
      ],
      { title: 'score <by> iteration' },
    );
    expect(XMLValidator.validate(svg)).toBe(true);
    expect(svg.match(/<polyline/g)?.length).toBe(2);
  });
});

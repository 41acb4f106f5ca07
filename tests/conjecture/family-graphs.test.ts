import { describe, expect, it } from 'vitest';
import { familyMembers, familyMembersOfOrder } from '../../src/conjecture/family-graphs.js';
import { graphsEqual } from '../../src/graph/graph.js';

/** Edge counts by closed forms (Bondy and Murty, "Graph Theory", 2008; common knowledge for these families). */
function expectedSize(family: string, args: number[]): number {
  const [a, b] = args;
  switch (family) {
    case 'emptyGraph':
      return 0;
    case 'path':
    case 'star':
      return a - 1;
    case 'cycle':
      return a;
    case 'complete':
      return (a * (a - 1)) / 2;
    case 'completeBipartite':
      return a * b;
    case 'turan': {
      // Parts of sizes floor(n/r) or ceil(n/r); edges = (n^2 - sum of squared part sizes) / 2.
      const q = Math.floor(a / b);
      const big = a % b;
      return (a * a - big * (q + 1) ** 2 - (b - big) * q * q) / 2;
    }
    case 'wheel':
      return 2 * (a - 1);
    case 'hypercube':
      return a * 2 ** (a - 1);
    case 'petersen':
      return 15;
    case 'friendship':
      return 3 * a;
    case 'lollipop':
      return (a * (a - 1)) / 2 + b;
    case 'barbell':
      return a * (a - 1) + b + 1;
    case 'broom':
      return a - 1 + b;
    case 'prism':
      return 3 * a;
    case 'ladder':
      return 3 * a - 2;
    default:
      throw new Error(`unknown family ${family}`);
  }
}

describe('familyMembers()', () => {
  it('gives members of every order 1..N, each with the edge count of its family', () => {
    let lastOrder = 0;
    for (const m of familyMembers(20)) {
      const match = /^(\w+)\(([\d,]*)\)$/.exec(m.label);
      expect(match, m.label).not.toBeNull();
      const args = match![2] === '' ? [] : match![2].split(',').map(Number);
      expect(m.graph.size, m.label).toBe(expectedSize(match![1], args));
      expect(m.graph.order).toBeGreaterThanOrEqual(lastOrder);
      lastOrder = m.graph.order;
    }
    expect(lastOrder).toBe(20);
  });

  it('includes the named graphs at their orders: Q3 on 8, Petersen on 10, Q4 on 16', () => {
    const labels = (n: number) => [...familyMembersOfOrder(n)].map((m) => m.label);
    expect(labels(8)).toContain('hypercube(3)');
    expect(labels(10)).toContain('petersen()');
    expect(labels(16)).toContain('hypercube(4)');
    expect(labels(9)).not.toContain('hypercube(3)');
  });

  it('repeats no labelled graph within an order', () => {
    for (let n = 1; n <= 16; n++) {
      const members = [...familyMembersOfOrder(n)];
      for (let i = 0; i < members.length; i++)
        for (let j = i + 1; j < members.length; j++)
          expect(
            graphsEqual(members[i].graph, members[j].graph),
            `${members[i].label} = ${members[j].label}`,
          ).toBe(false);
    }
  });

  it('is empty for N = 0 and has just the one-vertex graph for N = 1', () => {
    expect([...familyMembers(0)]).toEqual([]);
    expect([...familyMembers(1)].map((m) => m.label)).toEqual(['emptyGraph(1)']);
  });
});

import { describe, expect, it } from 'vitest';
import {
  defineConjecture,
  validateConjecture,
  MAX_CONJECTURE_VERTICES,
} from '../../src/conjecture/define.js';
import { ConjectureFieldError } from '../../src/conjecture/errors.js';
import { type ConjectureSpec } from '../../src/conjecture/types.js';

const valid: ConjectureSpec = {
  name: 'degree-spread-bound',
  statement: 'For connected G: maxDegree <= 2 minDegree',
  vertices: 12,
  score: (g) => g.maxDegree - 2 * g.minDegree,
};

function fieldError(spec: unknown): ConjectureFieldError {
  try {
    validateConjecture(spec);
  } catch (err) {
    if (err instanceof ConjectureFieldError) return err;
    throw err;
  }
  throw new Error('expected a ConjectureFieldError');
}

describe('defineConjecture()', () => {
  it('returns a frozen conjecture with connected defaulting to false and no where', () => {
    const c = defineConjecture(valid);
    expect(Object.isFrozen(c)).toBe(true);
    expect(c.connected).toBe(false);
    expect(c.where).toBeUndefined();
    expect(c.name).toBe('degree-spread-bound');
    expect(c.score).toBe(valid.score);
  });

  it('keeps connected and where when given', () => {
    const where = () => true;
    const c = defineConjecture({ ...valid, connected: true, where });
    expect(c.connected).toBe(true);
    expect(c.where).toBe(where);
  });

  it.each([
    ['Degree Bound', 'name'],
    ['', 'name'],
    ['a'.repeat(65), 'name'],
    [42, 'name'],
  ])('rejects the name %j, naming the field', (name, field) => {
    const err = fieldError({ ...valid, name });
    expect(err.field).toBe(field);
    expect(err.message).toContain("field 'name'");
    expect(err.message).toContain("a-z, 0-9 and '-'");
  });

  it.each([
    ['statement', '   ', 'non-empty string'],
    ['statement', undefined, 'non-empty string'],
    ['vertices', 0, `1..${MAX_CONJECTURE_VERTICES}`],
    ['vertices', 2.5, 'integer'],
    ['vertices', '8', 'but found "8"'],
    ['vertices', MAX_CONJECTURE_VERTICES + 1, `1..${MAX_CONJECTURE_VERTICES}`],
    ['connected', 'yes', 'true or false'],
    ['where', 5, 'a function (g) => boolean'],
    ['score', undefined, 'a function (g) => number'],
    ['score', 3, 'but found 3'],
  ])('rejects %s = %j with a message naming the conjecture and the field', (field, value, expected) => {
    const err = fieldError({ ...valid, [field]: value });
    expect(err.field).toBe(field);
    expect(err.conjecture).toBe("conjecture 'degree-spread-bound'");
    expect(err.message).toContain(`field '${field}'`);
    expect(err.message).toContain(expected);
  });

  it('rejects an unknown field and suggests the field meant', () => {
    const err = fieldError({ ...valid, conected: true });
    expect(err.field).toBe('conected');
    expect(err.message).toContain("did you mean 'connected'?");
  });

  it('rejects something that is not an object', () => {
    expect(fieldError([valid]).message).toContain('expected an object');
    expect(fieldError(null).message).toContain('but found null');
  });
});

/**
 * The move families the polisher draws on, grouped by how the search uses them: the descent at
 * a fixed order visits FIXED_ORDER_FAMILIES in this order (smallest neighbourhoods first, as in
 * variable neighbourhood descent); ORDER_CHANGING_FAMILIES are part of the descent in free-order
 * mode and are only looked at (never moved to) in fixed-order mode.
 */
import { ATTACH_PENDANT } from './moves/attach-pendant.js';
import { DELETE_VERTEX } from './moves/delete-vertex.js';
import { DOUBLE_EDGE_SWAP } from './moves/double-edge-swap.js';
import { type MoveFamily } from './moves/move-family.js';
import { MOVE_LEAF } from './moves/move-leaf.js';
import { LENGTHEN_PENDANT_PATH, SHORTEN_PENDANT_PATH } from './moves/pendant-path.js';
import { ROTATE_EDGE } from './moves/rotate-edge.js';
import { SUBDIVIDE_EDGE } from './moves/subdivide-edge.js';
import { TOGGLE_PAIR } from './moves/toggle-pair.js';

export const FIXED_ORDER_FAMILIES: readonly MoveFamily[] = [
  MOVE_LEAF,
  TOGGLE_PAIR,
  ROTATE_EDGE,
  DOUBLE_EDGE_SWAP,
];

export const ORDER_CHANGING_FAMILIES: readonly MoveFamily[] = [
  LENGTHEN_PENDANT_PATH,
  SHORTEN_PENDANT_PATH,
  ATTACH_PENDANT,
  SUBDIVIDE_EDGE,
  DELETE_VERTEX,
];

export const ALL_FAMILIES: readonly MoveFamily[] = [...FIXED_ORDER_FAMILIES, ...ORDER_CHANGING_FAMILIES];

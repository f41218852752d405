/**
 * How finely curved windings become straight segments. Ring models need none of this: rings stay
 * rings, for which closed forms exist.
 */

/**
 * Segments per turn of a true spiral or helix path. The inscribed 96-gon's area falls short of
 * its circle's by (2π/96)²/6 ≈ 0.07 %, an order of magnitude below the 0.5–2 % by which the
 * spiral and ring models of one winding differ (the difference this option exists to show),
 * while a 20-turn spiral stays below 2000 segments for the quadratic Neumann sums.
 */
export const SEGMENTS_PER_TURN = 96;

/**
 * Segments per quarter-circle corner of a rectangular spiral. The chords cut a corner of radius
 * c by a sagitta of c (1 - cos(π/32)) ≈ 0.005 c and shorten its length by ≈ 0.16 %; corners are a
 * small part of a turn's perimeter, so a turn's length is short by well under 0.1 %.
 */
export const ARC_SEGMENTS_PER_QUARTER = 8;

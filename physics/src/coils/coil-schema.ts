/**
 * Coil models as JSON: zod schemas and their types. SI units (metres); every object is strict, so
 * a misspelt field is an error rather than a silently ignored input. Radii and diameters are
 * conductor centre lines; see physics/README.md for frames and conventions.
 *
 * Each kind's schema checks its fields' ranges (COIL_LIMITS) and, once those hold, the cross-field
 * rules of `coilGeometryIssues` (overlapping turns, inner ≥ outer, a spiral that does not fit, a
 * corner radius too large, a ferrite surface cutting the winding). Use `parseCoil` for one
 * RangeError naming the field instead of a list of zod issues.
 */
import { z } from 'zod';
import { COIL_LIMITS as L } from './coil-limits';
import { coilGeometryIssues } from './coil-geometry-issues';
import { formatLength as fmt } from './format-length';
import { numberField } from './number-field';

const length = (range: { min: number; max: number }) => numberField({ ...range, unit: 'm' });
const coilSize = length(L.coilSize);
const conductorSize = length(L.conductorSize);
const positive = (range: { min: number; max: number }) =>
  numberField({ ...range, unit: '', minExclusive: true });
const count = (range: { min: number; max: number }) =>
  numberField({ ...range, unit: '', integer: true });

/** A strict object whose unknown-key error lists the fields it allows. */
function strict<T extends z.core.$ZodLooseShape>(shape: T) {
  const fields = Object.keys(shape).join(', ');
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === 'unrecognized_keys' ? `unknown field; allowed fields: ${fields}` : undefined,
  });
}

/** Round (magnet) wire of copper diameter `diameter`. */
export const roundConductorSchema = strict({ type: z.literal('round'), diameter: conductorSize });

/** Litz: `strands` strands of `strandDiameter`; the bundle diameter is estimated if missing. */
export const litzConductorSchema = strict({
  type: z.literal('litz'),
  strands: count(L.strands),
  strandDiameter: conductorSize,
  bundleDiameter: conductorSize.optional(),
}).superRefine((litz, ctx) => {
  const copper = litz.strandDiameter * Math.sqrt(litz.strands);
  if (litz.bundleDiameter !== undefined && litz.bundleDiameter < copper) {
    ctx.addIssue({
      code: 'custom',
      path: ['bundleDiameter'],
      message:
        `${fmt(litz.bundleDiameter)} is below the copper's own size ${fmt(copper)}; ` +
        'allowed: bundleDiameter ≥ strandDiameter · sqrt(strands)',
    });
  }
});

/** PCB trace (or foil) of `width` across the turns and `thickness` across the layers. */
export const traceConductorSchema = strict({
  type: z.literal('trace'),
  width: conductorSize,
  thickness: conductorSize,
});

export const conductorSchema = z.discriminatedUnion(
  'type',
  [roundConductorSchema, litzConductorSchema, traceConductorSchema],
  { error: () => 'unknown conductor type; allowed: round, litz, trace' },
);
export type Conductor = z.infer<typeof conductorSchema>;

/**
 * Ferrite backing: an infinite plate of relative permeability `mur` filling z < -distance in the
 * coil's frame, modelled by the method of images. An approximation: real ferrite is finite,
 * saturates and has losses.
 */
export const backingSchema = strict({
  mur: numberField({ ...L.mur, unit: '' }),
  distance: length(L.backingDistance),
});
export type Backing = z.infer<typeof backingSchema>;

const common = {
  name: z.string().min(L.nameLength.min).max(L.nameLength.max).optional(),
  backing: backingSchema.optional(),
};
const layered = {
  layers: count(L.layers).optional(),
  layerSpacing: length(L.layerSpacing).optional(),
};

/** Adds the cross-field rules, run only once every field is within its own range. */
function withRules<T extends z.ZodType>(schema: T) {
  return schema.superRefine(
    (coil, ctx) => {
      for (const issue of coilGeometryIssues(coil as Coil)) {
        ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
      }
    },
    // Out-of-range values (a million path points, say) must not reach the geometry checks.
    { when: (payload) => payload.issues.length === 0 },
  );
}

/** One circular turn of round wire: centre-line radius and wire radius. */
export const ringCoilSchema = withRules(
  strict({ kind: z.literal('ring'), radius: coilSize, wireRadius: conductorSize, ...common }),
);

/** Explicit coaxial rings {r, z} on the local +z axis, one wire radius (the CLI contract). */
export const ringsCoilSchema = withRules(
  strict({
    kind: z.literal('rings'),
    wireRadius: conductorSize,
    rings: z
      .array(strict({ r: coilSize, z: length(L.position) }))
      .min(L.ringCount.min, { error: 'needs at least one ring; allowed: 1 to 5000 rings' })
      .max(L.ringCount.max, { error: 'too many rings; allowed: 1 to 5000 rings' }),
    ...common,
  }),
);

/** Circular planar spiral: inner + outer diameter, or inner radius + pitch. */
export const circularSpiralCoilSchema = withRules(
  strict({
    kind: z.literal('circular-spiral'),
    turns: positive(L.turns),
    innerDiameter: coilSize.optional(),
    outerDiameter: coilSize.optional(),
    innerRadius: coilSize.optional(),
    pitch: length(L.pitch).optional(),
    ...layered,
    model: z
      .enum(['rings', 'spiral'], { error: () => 'unknown model; allowed: rings, spiral' })
      .optional(),
    conductor: conductorSchema,
    ...common,
  }),
);

/** Rectangular planar spiral given by its outer turn; turns advance inward. */
export const rectangularSpiralCoilSchema = withRules(
  strict({
    kind: z.literal('rectangular-spiral'),
    outerWidth: coilSize,
    outerHeight: coilSize,
    cornerRadius: length(L.cornerRadius),
    pitch: length(L.pitch),
    turns: positive(L.turns),
    ...layered,
    conductor: conductorSchema,
    ...common,
  }),
);

/** Helical solenoid along local +z from z = 0 to z = length; layers grow outward. */
export const solenoidCoilSchema = withRules(
  strict({
    kind: z.literal('solenoid'),
    radius: coilSize,
    length: coilSize,
    turns: positive(L.turns),
    ...layered,
    model: z
      .enum(['rings', 'helix'], { error: () => 'unknown model; allowed: rings, helix' })
      .optional(),
    conductor: conductorSchema,
    ...common,
  }),
);

/** A custom winding: a polyline of 3D points in the coil's frame. */
export const pathCoilSchema = withRules(
  strict({
    kind: z.literal('path'),
    points: z
      .array(strict({ x: length(L.position), y: length(L.position), z: length(L.position) }))
      .min(L.pointCount.min, { error: 'needs at least 2 points; allowed: 2 to 5000 points' })
      .max(L.pointCount.max, { error: 'too many points; allowed: 2 to 5000 points' }),
    closed: z.boolean({ error: () => 'expected true or false' }).optional(),
    conductor: conductorSchema,
    ...common,
  }),
);

export const coilSchema = z.discriminatedUnion(
  'kind',
  [
    ringCoilSchema,
    ringsCoilSchema,
    circularSpiralCoilSchema,
    rectangularSpiralCoilSchema,
    solenoidCoilSchema,
    pathCoilSchema,
  ],
  {
    error: () =>
      'unknown coil kind; allowed: ring, rings, circular-spiral, rectangular-spiral, ' +
      'solenoid, path',
  },
);

export type RingCoil = z.infer<typeof ringCoilSchema>;
export type RingsCoil = z.infer<typeof ringsCoilSchema>;
export type CircularSpiralCoil = z.infer<typeof circularSpiralCoilSchema>;
export type RectangularSpiralCoil = z.infer<typeof rectangularSpiralCoilSchema>;
export type SolenoidCoil = z.infer<typeof solenoidCoilSchema>;
export type PathCoil = z.infer<typeof pathCoilSchema>;
export type Coil = z.infer<typeof coilSchema>;

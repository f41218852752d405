import { circularSpiralGeometry } from './circular-spiral-geometry';
import type {
  CircularSpiralCoil,
  Coil,
  Conductor,
  PathCoil,
  RectangularSpiralCoil,
  RingsCoil,
  SolenoidCoil,
} from './coil-schema';
import { conductorSection } from './conductor-section';
import { formatLength as f } from './format-length';
import { pathOverlap } from './path-overlap';

/** A cross-field problem: the path of the field to blame (inside the coil) and what is wrong. */
export interface GeometryIssue {
  path: (string | number)[];
  message: string;
}

/** Stacks of layers taller than this are not a coil any more (and break the models' premise). */
const MAX_STACK = 1;
/** Coils larger than this are outside every model's intended use (COIL_LIMITS.coilSize). */
const MAX_SIZE = 10;

/**
 * Cross-field rules of a coil whose fields are each within range: turns that would overlap, an
 * inner size not below the outer one, a spiral that does not fit, a corner radius larger than
 * half the side, layers closer than the conductor is thick, a ferrite surface cutting the winding.
 *
 * Method: plain geometry on conductor centre lines and the conductor section (conductorSection).
 * Neighbouring turns overlap when their centre lines are closer than the conductor width; layers
 * overlap when closer than its thickness. Explicit rings and paths are tested pairwise.
 *
 * References: none needed (plain geometry); segment distances after Ericson 2005, §5.1.9.
 *
 * @param coil a coil whose every field is within its own range
 * @returns the issues found, empty when the coil is buildable
 * @example coilGeometryIssues({ kind: 'ring', radius: 1e-3, wireRadius: 2e-3 })[0].path
 *   // ['wireRadius']
 */
export function coilGeometryIssues(coil: Coil): GeometryIssue[] {
  const issues: GeometryIssue[] = [];
  const add = (path: (string | number)[], message: string) => issues.push({ path, message });
  switch (coil.kind) {
    case 'ring':
      if (coil.wireRadius >= coil.radius) {
        add(
          ['wireRadius'],
          `${f(coil.wireRadius)} is not below the radius ${f(coil.radius)}; ` +
            'allowed: wireRadius < radius',
        );
      }
      break;
    case 'rings':
      ringsIssues(coil, add);
      break;
    case 'circular-spiral':
      circularSpiralIssues(coil, add);
      break;
    case 'rectangular-spiral':
      rectangularSpiralIssues(coil, add);
      break;
    case 'solenoid':
      solenoidIssues(coil, add);
      break;
    case 'path':
      pathIssues(coil, add);
      break;
  }
  if (issues.length === 0) backingIssues(coil, add);
  return issues;
}

type Add = (path: (string | number)[], message: string) => void;

function ringsIssues(coil: RingsCoil, add: Add): void {
  const a = coil.wireRadius;
  coil.rings.forEach((ring, i) => {
    if (ring.r <= a) {
      add(
        ['rings', i, 'r'],
        `${f(ring.r)} is not above the wire radius ${f(a)}; allowed: r > wireRadius`,
      );
    }
  });
  // Sorted by radius, only rings within one wire diameter in r can touch.
  const order = coil.rings.map((ring, i) => ({ ...ring, i })).sort((p, q) => p.r - q.r);
  for (let m = 0; m < order.length; m++) {
    for (let n = m + 1; n < order.length && order[n].r - order[m].r < 2 * a; n++) {
      const gap = Math.hypot(order[n].r - order[m].r, order[n].z - order[m].z);
      if (gap < 2 * a) {
        const [i, j] = [order[m].i, order[n].i].sort((x, y) => x - y);
        add(
          ['rings', j],
          `lies ${f(gap)} from rings[${i}], closer than the wire diameter ` +
            `${f(2 * a)} (turns would overlap); allowed: rings at least 2 · wireRadius apart`,
        );
        return;
      }
    }
  }
}

function circularSpiralIssues(coil: CircularSpiralCoil, add: Add): void {
  const byDiameter = coil.innerDiameter !== undefined || coil.outerDiameter !== undefined;
  const byPitch = coil.innerRadius !== undefined || coil.pitch !== undefined;
  const forms = 'either innerDiameter + outerDiameter or innerRadius + pitch';
  if (byDiameter && byPitch) {
    add(
      [coil.innerRadius !== undefined ? 'innerRadius' : 'pitch'],
      `given together with innerDiameter/outerDiameter; allowed: ${forms}, not both`,
    );
    return;
  }
  if (!byDiameter && !byPitch) {
    add(['innerDiameter'], `missing; allowed: ${forms}`);
    return;
  }
  for (const [field, other] of [
    ['innerDiameter', 'outerDiameter'],
    ['innerRadius', 'pitch'],
  ] as const) {
    const has = (key: typeof field | typeof other) => coil[key] !== undefined;
    if (has(field) !== has(other)) {
      add(
        [has(field) ? other : field],
        `missing (${has(field) ? field : other} needs it); allowed: ${forms}`,
      );
      return;
    }
  }
  const { width } = conductorSection(coil.conductor);
  if (byDiameter) {
    const din = coil.innerDiameter as number;
    const dout = coil.outerDiameter as number;
    if (dout <= din) {
      add(
        ['outerDiameter'],
        `${f(dout)} is not above innerDiameter ${f(din)}; ` +
          'allowed: outerDiameter > innerDiameter',
      );
      return;
    }
    if (coil.turns <= 1) {
      add(
        ['turns'],
        `${coil.turns} leaves no room between inner and outer diameter; allowed: ` +
          'turns > 1 with innerDiameter + outerDiameter (use innerRadius + pitch for one turn)',
      );
      return;
    }
  }
  const g = circularSpiralGeometry(coil);
  if (g.pitch < width) {
    const field = byDiameter ? 'outerDiameter' : 'pitch';
    const what = byDiameter ? `gives a pitch of ${f(g.pitch)}, ` : `${f(g.pitch)} is `;
    add(
      [field],
      `${what}below the conductor width ${f(width)} (turns would overlap); ` +
        'allowed: pitch ≥ conductor width' +
        (byDiameter
          ? ', outerDiameter ≥ innerDiameter + 2 · (ceil(turns) - 1) · conductor width = ' +
            f(2 * g.innerRadius + 2 * (g.ringCount - 1) * width)
          : ''),
    );
    return;
  }
  const start = coil.model === 'spiral' ? g.innerRadius - g.pitch / 2 : g.innerRadius;
  if (start < width / 2) {
    const field = byDiameter ? 'innerDiameter' : 'innerRadius';
    const why = coil.model === 'spiral' ? 'the spiral starts half a pitch inside it' : 'ring 0';
    add(
      [field],
      `puts the innermost conductor across the axis (${why}); allowed: innermost ` +
        `centre-line radius ≥ conductor width / 2${coil.model === 'spiral' ? ' + pitch / 2' : ''}`,
    );
    return;
  }
  if (g.outerRadius > MAX_SIZE) {
    add(
      ['turns'],
      `the spiral does not fit: outermost radius ${f(g.outerRadius)}; allowed: ≤ 10 m`,
    );
    return;
  }
  layerIssues(coil.layers, coil.layerSpacing, coil.conductor, add);
}

function rectangularSpiralIssues(coil: RectangularSpiralCoil, add: Add): void {
  const { width } = conductorSection(coil.conductor);
  if (coil.pitch < width) {
    add(
      ['pitch'],
      `${f(coil.pitch)} is below the conductor width ${f(width)} (turns would ` +
        'overlap); allowed: pitch ≥ conductor width',
    );
    return;
  }
  const side = Math.min(coil.outerWidth, coil.outerHeight);
  if (coil.cornerRadius > side / 2) {
    add(
      ['cornerRadius'],
      `${f(coil.cornerRadius)} is larger than half the outer turn's shorter ` +
        `side (${f(side / 2)}); allowed: 0 ≤ cornerRadius ≤ min(outerWidth, outerHeight) / 2`,
    );
    return;
  }
  const rings = Math.max(1, Math.ceil(coil.turns - 1e-12));
  const innerSide = side - 2 * (rings - 1) * coil.pitch;
  if (innerSide < width) {
    const most = Math.floor((side - width) / (2 * coil.pitch)) + 1;
    add(
      ['turns'],
      `${coil.turns} turns at pitch ${f(coil.pitch)} do not fit inside the outer turn (the ` +
        `innermost turn's shorter side would be ${f(innerSide)}, less than the conductor ` +
        `width ${f(width)}); allowed: turns ≤ ${most} for this outer size and pitch`,
    );
    return;
  }
  layerIssues(coil.layers, coil.layerSpacing, coil.conductor, add);
}

function solenoidIssues(coil: SolenoidCoil, add: Add): void {
  const { width, thickness } = conductorSection(coil.conductor);
  const pitch = coil.length / coil.turns;
  if (pitch < width) {
    add(
      ['length'],
      `${f(coil.length)} for ${coil.turns} turns gives a pitch of ${f(pitch)}, ` +
        `below the conductor width ${f(width)} (turns would overlap); allowed: length ≥ turns · ` +
        `conductor width = ${f(coil.turns * width)}`,
    );
    return;
  }
  if (coil.radius < thickness / 2) {
    add(
      ['radius'],
      `${f(coil.radius)} puts the conductor across the axis; allowed: radius ≥ ` +
        `conductor thickness / 2 = ${f(thickness / 2)}`,
    );
    return;
  }
  layerIssues(coil.layers, coil.layerSpacing, coil.conductor, add);
}

function pathIssues(coil: PathCoil, add: Add): void {
  const points = coil.points;
  if (coil.closed && points.length < 3) {
    add(['points'], `a closed path has ${points.length} points; allowed: at least 3 points`);
    return;
  }
  // Segments shorter than this carry no geometry and only slow the kernels.
  const shortest = 1e-6;
  const n = points.length;
  const segments = coil.closed ? n : n - 1;
  for (let i = 0; i < segments; i++) {
    const p = points[i];
    const q = points[(i + 1) % n];
    if (Math.hypot(q.x - p.x, q.y - p.y, q.z - p.z) < shortest) {
      add(
        ['points', (i + 1) % n],
        `coincides with points[${i}]; allowed: neighbouring points ` + 'at least 1 µm apart',
      );
      return;
    }
  }
  const { width, thickness } = conductorSection(coil.conductor);
  const overlap = pathOverlap(points, coil.closed ?? false, Math.max(width, thickness));
  if (overlap) {
    add(
      ['points', overlap.second],
      `the segment from here runs ${f(overlap.distance)} from the ` +
        `segment from points[${overlap.first}], closer than the conductor ` +
        `${f(Math.max(width, thickness))} (the winding would overlap itself); allowed: parts ` +
        'of the path at least one conductor width apart',
    );
  }
}

function layerIssues(
  layers: number | undefined,
  spacing: number | undefined,
  conductor: Conductor,
  add: Add,
): void {
  if ((layers ?? 1) <= 1) return;
  const { thickness } = conductorSection(conductor);
  if (spacing === undefined) {
    add(
      ['layerSpacing'],
      `missing; needed when layers > 1; allowed: layerSpacing ≥ conductor ` +
        `thickness ${f(thickness)}`,
    );
  } else if (spacing < thickness) {
    add(
      ['layerSpacing'],
      `${f(spacing)} is below the conductor thickness ${f(thickness)} (layers ` +
        'would overlap); allowed: layerSpacing ≥ conductor thickness',
    );
  } else if ((layers! - 1) * spacing > MAX_STACK) {
    add(
      ['layerSpacing'],
      `${layers} layers × ${f(spacing)} make a stack of ` +
        `${f((layers! - 1) * spacing)}; allowed: (layers - 1) · layerSpacing ≤ 1 m`,
    );
  }
}

function backingIssues(coil: Coil, add: Add): void {
  if (!coil.backing) return;
  const lowest = lowestConductorPoint(coil);
  if (-coil.backing.distance > lowest) {
    add(
      ['backing', 'distance'],
      `${f(coil.backing.distance)} puts the ferrite surface inside the winding (lowest ` +
        `conductor edge at z = ${f(lowest)}); allowed: distance ≥ ${f(-lowest)}`,
    );
  }
}

/** Lowest z reached by conductor material in the coil's frame, m. */
function lowestConductorPoint(coil: Coil): number {
  switch (coil.kind) {
    case 'ring':
      return -coil.wireRadius;
    case 'rings':
      return Math.min(...coil.rings.map((ring) => ring.z)) - coil.wireRadius;
    case 'circular-spiral':
    case 'rectangular-spiral':
      return -conductorSection(coil.conductor).thickness / 2;
    case 'solenoid':
      // The helix's leads start at z = 0; the conductor reaches half its axial width below.
      return -conductorSection(coil.conductor).width / 2;
    case 'path': {
      const { width, thickness } = conductorSection(coil.conductor);
      return Math.min(...coil.points.map((p) => p.z)) - Math.max(width, thickness) / 2;
    }
  }
}

import type { Coil, Conductor } from '../../../../physics/src/index';
import { formatQuantity } from '../units/format-quantity';

/** What the library table shows of a coil's geometry, with numbers to sort by. */
export interface CoilSummary {
  /** The size a designer names the coil by, e.g. "Ø 44.0 mm" or "60.0 × 40.0 mm". */
  size: string;
  /** Largest extent across the winding, m (for sorting). */
  sizeValue: number;
  /** Turns as text, e.g. "12", "12 × 2 layers". */
  turns: string;
  /** Total turns (turns × layers), for sorting; 0 for a custom path. */
  turnsValue: number;
  /** The conductor, e.g. "Litz 105 × 0.100 mm". */
  conductor: string;
}

const mm = (metres: number) => formatQuantity(metres, 'm');

/**
 * Summarises a coil spec for the library table: its key size, turns and conductor.
 *
 * @param coil a stored coil spec (validated by the engine on the way in), SI units
 * @returns texts and sort values
 * @example coilSummary({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }).size // 'Ø 40.0 mm'
 */
export function coilSummary(coil: Coil): CoilSummary {
  switch (coil.kind) {
    case 'ring':
      return {
        size: `Ø ${mm(2 * coil.radius)}`,
        sizeValue: 2 * coil.radius,
        turns: '1',
        turnsValue: 1,
        conductor: `Wire Ø ${mm(2 * coil.wireRadius)}`,
      };
    case 'rings': {
      const widest = Math.max(...coil.rings.map((ring) => ring.r));
      return {
        size: `Ø ${mm(2 * widest)}`,
        sizeValue: 2 * widest,
        turns: String(coil.rings.length),
        turnsValue: coil.rings.length,
        conductor: `Wire Ø ${mm(2 * coil.wireRadius)}`,
      };
    }
    case 'circular-spiral': {
      const outer =
        coil.outerDiameter ??
        2 * ((coil.innerRadius ?? 0) + Math.max(0, Math.ceil(coil.turns) - 1) * (coil.pitch ?? 0));
      return {
        size: `Ø ${mm(outer)}`,
        sizeValue: outer,
        ...turns(coil.turns, coil.layers),
        conductor: conductorText(coil.conductor),
      };
    }
    case 'rectangular-spiral':
      return {
        size: pair(coil.outerWidth, coil.outerHeight),
        sizeValue: Math.max(coil.outerWidth, coil.outerHeight),
        ...turns(coil.turns, coil.layers),
        conductor: conductorText(coil.conductor),
      };
    case 'solenoid':
      return {
        size: `Ø ${mm(2 * coil.radius)}, ${mm(coil.length)} long`,
        sizeValue: Math.max(2 * coil.radius, coil.length),
        ...turns(coil.turns, coil.layers),
        conductor: conductorText(coil.conductor),
      };
    case 'path': {
      const xs = coil.points.map((p) => p.x);
      const ys = coil.points.map((p) => p.y);
      const width = Math.max(...xs) - Math.min(...xs);
      const height = Math.max(...ys) - Math.min(...ys);
      return {
        size: pair(width, height),
        sizeValue: Math.max(width, height),
        turns: `${coil.points.length} points`,
        turnsValue: 0,
        conductor: conductorText(coil.conductor),
      };
    }
  }
}

function turns(
  count: number,
  layers: number | undefined,
): Pick<CoilSummary, 'turns' | 'turnsValue'> {
  const n = Number(count.toPrecision(4));
  const stack = layers ?? 1;
  return {
    turns: stack > 1 ? `${n} × ${stack} layers` : String(n),
    turnsValue: count * stack,
  };
}

/** The conductor in a few words: "Round Ø 0.800 mm", "Litz 105 × 0.100 mm", "Trace 1.00 mm × 35.0 µm". */
export function conductorText(conductor: Conductor): string {
  switch (conductor.type) {
    case 'round':
      return `Round Ø ${mm(conductor.diameter)}`;
    case 'litz':
      return `Litz ${conductor.strands} × ${mm(conductor.strandDiameter)}`;
    case 'trace':
      return `Trace ${mm(conductor.width)} × ${mm(conductor.thickness)}`;
  }
}

/** "60.0 × 40.0 mm": the unit once when both sides share it. */
function pair(a: number, b: number): string {
  const [first, second] = [mm(a), mm(b)];
  const unit = (text: string) => text.slice(text.lastIndexOf(' '));
  return unit(first) === unit(second)
    ? `${first.slice(0, first.lastIndexOf(' '))} × ${second}`
    : `${first} × ${second}`;
}

/**
 * The conductor of a winding, as the coil models define it (SI units, metres): round wire, Litz
 * bundle (strands × strand diameter, optional bundle diameter) or PCB trace (width × thickness).
 * Ring coils carry a wire radius instead and are read as round wire of diameter 2·wireRadius.
 */
export type { Conductor } from '../coils/coil-schema';

/** The text of `couplet --help`. */
export const CLI_USAGE = `Usage: couplet <command> FILE [options]

Couplet physics from the command line. FILE is a JSON file, or - for standard input.
SI units throughout: metres, degrees for tilts, henries, ohms, hertz, amperes.

Commands
  mutual FILE        FILE holds one pair or an array of pairs
                     {"tx": coil, "rx": coil, "pose": {x, y, z, tiltX, tiltY, yaw}, "frequency"?}
                     prints {"M", "L1", "L2", "k"} per pair, in the same shape (object or array)
  inductance FILE    FILE holds one coil or an array of coils; beside the coil fields each may
                     carry "frequency" (Hz), "current" (A, default 1) and "temperature" (°C,
                     default 20). Prints {"L", "Rdc", "Rac", "Q", "storedEnergy", "timeConstant",
                     "wireLength", "skinDepth", "frequency", "current"} per coil; without a
                     frequency Rac, Q and skinDepth are null. L is the low-frequency inductance.
  sweep FILE         FILE is {"tx": coil, "rx": coil, "sweep": {"x", "y", "z", "tiltX", "tiltY"}},
                     each axis a number or {"from", "to", "steps"} (z required; others default 0)
                     prints CSV x_m,y_m,z_m,tiltX_deg,tiltY_deg,M_H,k (x varies fastest)

Options
  --out PATH         write the result to PATH instead of standard output
  --format csv|json  sweep output format (default csv)
  -h, --help         show this help

Exit codes: 0 success, 2 bad input (message on stderr names the field), 1 internal error,
130 cancelled. Figures come from filament models (no ferrite saturation, eddy currents in nearby
metal or self-resonance; proximity losses are not in Rac). Resonant tanks develop high voltages:
follow local codes and licensed practice; validate with bench data.
`;

import { create, unitDependencies } from 'mathjs';

/**
 * A mathjs instance with units only (parse, convert, compare dimensions). `create(all)` would add
 * about 570 kB to the browser bundle for an expression evaluator the fields do not need.
 */
export const unitMath = create({ unitDependencies });

/**
 * The physics engine's version, stored with every result (sweep runs, study revisions) so that a
 * number shown in a review can be traced to the code that computed it. Raise it whenever a change
 * can move a computed value: a new kernel, a tolerance, a default model.
 */
export const ENGINE_VERSION = '1.0.0';

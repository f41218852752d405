/**
 * Run a computation for one input item and prefix a RangeError from the physics with the item's
 * path, so every CLI message names its input: `pose: the coils intersect …` becomes
 * `pairs[2].pose: the coils intersect …`.
 *
 * Method: try/catch; a message that starts with a field name (`name:` or `a.b[1]:`) gets
 * `path.` in front, any other `path: `; messages that already start with the path are left alone.
 *
 * References: none.
 *
 * @param path the item's name in messages
 * @param run the computation
 * @returns its result
 * @example withInputPath('pairs[0]', () => 1) // 1
 */
export function withInputPath<T>(path: string, run: () => T): T {
  try {
    return run();
  } catch (e) {
    if (e instanceof RangeError && !e.message.startsWith(path)) {
      const named = /^[A-Za-z_][\w.[\]]*: /.test(e.message);
      throw new RangeError(named ? `${path}.${e.message}` : `${path}: ${e.message}`);
    }
    throw e;
  }
}

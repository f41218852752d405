import { BufferGeometry, Float32BufferAttribute, Vector3 } from 'three';

/**
 * A tube of constant radius along a polyline, through every vertex (three's TubeGeometry samples
 * a curve evenly and would cut the corners of a rectangular turn). Cross-sections are carried
 * along by parallel transport, so the tube does not twist; at a vertex the section is normal to
 * the mean of the two segment directions.
 *
 * @param points the vertices (scene units)
 * @param closed whether the last vertex joins the first
 * @param radius tube radius (scene units)
 * @param radial vertices around each section
 * @returns an indexed geometry with normals
 */
export function polylineTube(
  points: readonly Vector3[],
  closed: boolean,
  radius: number,
  radial = 8,
): BufferGeometry {
  const pts = dropRepeats(points, closed);
  const n = pts.length;
  const geometry = new BufferGeometry();
  if (n < 2) return geometry;
  const at = (i: number) => pts[((i % n) + n) % n];
  const tangents = pts.map((p, i) => {
    const ahead =
      closed || i < n - 1
        ? at(i + 1)
            .clone()
            .sub(p)
            .normalize()
        : null;
    const behind =
      closed || i > 0
        ? p
            .clone()
            .sub(at(i - 1))
            .normalize()
        : null;
    const t = (ahead ?? new Vector3()).add(behind ?? new Vector3());
    return t.lengthSq() > 1e-20 ? t.normalize() : (ahead ?? behind ?? new Vector3(0, 0, 1));
  });
  // A first normal not parallel to the first tangent, then parallel transport.
  const t0 = tangents[0];
  const seed = Math.abs(t0.z) < 0.9 ? new Vector3(0, 0, 1) : new Vector3(1, 0, 0);
  let normal = seed.sub(t0.clone().multiplyScalar(seed.dot(t0))).normalize();
  const positions: number[] = [];
  const normals: number[] = [];
  const rings = closed ? n + 1 : n;
  for (let i = 0; i < rings; i++) {
    const t = tangents[i % n];
    if (i > 0) {
      normal = normal.sub(t.clone().multiplyScalar(normal.dot(t)));
      if (normal.lengthSq() < 1e-20) normal = seed.clone();
      normal.normalize();
    }
    const binormal = t.clone().cross(normal);
    const p = at(i);
    for (let j = 0; j < radial; j++) {
      const a = (2 * Math.PI * j) / radial;
      const d = normal
        .clone()
        .multiplyScalar(Math.cos(a))
        .add(binormal.clone().multiplyScalar(Math.sin(a)));
      normals.push(d.x, d.y, d.z);
      positions.push(p.x + radius * d.x, p.y + radius * d.y, p.z + radius * d.z);
    }
  }
  const index: number[] = [];
  for (let i = 0; i < rings - 1; i++) {
    for (let j = 0; j < radial; j++) {
      const a = i * radial + j;
      const b = i * radial + ((j + 1) % radial);
      const c = (i + 1) * radial + j;
      const d = (i + 1) * radial + ((j + 1) % radial);
      index.push(a, b, c, b, d, c);
    }
  }
  geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
  geometry.setAttribute('normal', new Float32BufferAttribute(normals, 3));
  geometry.setIndex(index);
  return geometry;
}

/** Consecutive equal vertices (and a closing copy of the first) give no direction: drop them. */
function dropRepeats(points: readonly Vector3[], closed: boolean): Vector3[] {
  const out: Vector3[] = [];
  for (const p of points) {
    if (out.length === 0 || out[out.length - 1].distanceToSquared(p) > 1e-24) out.push(p);
  }
  if (closed && out.length > 2 && out[0].distanceToSquared(out[out.length - 1]) <= 1e-24) {
    out.pop();
  }
  return out;
}

import {
  AmbientLight,
  AxesHelper,
  BoxGeometry,
  BufferGeometry,
  Color,
  DirectionalLight,
  GridHelper,
  Group,
  HemisphereLight,
  Matrix4,
  Mesh,
  MeshStandardMaterial,
  PerspectiveCamera,
  Quaternion,
  Scene,
  TorusGeometry,
  Vector3,
  WebGLRenderer,
  type Material,
} from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import { mergeGeometries } from 'three/examples/jsm/utils/BufferGeometryUtils.js';
import type { StudyPose } from '../api-types';
import type { CoilDrawing, PairDrawing, WindingTube } from './pair-geometry';
import { polylineTube } from './polyline-tube';
import { rxMatrix } from './rx-matrix';

/** Scene units are millimetres: numbers a designer reads, and a sane depth range for any pad. */
const MM = 1000;
/** Vertices the ring tubes of one coil may use in all, so a 1000-turn coil stays fluid. */
const RING_VERTEX_BUDGET = 400_000;

export type ViewPreset = 'top' | 'side' | 'iso';

/** The colours of the view, read from the theme by the component. */
export interface SceneColours {
  tx: string;
  rx: string;
  ferrite: string;
  grid: string;
}

/**
 * The three.js view of a Tx–Rx pair to scale. Renders on demand only (a control move, a pose, a
 * resize), never in a loop. The Tx frame is the world frame (+z up); the Rx is placed with the
 * engine's pose rotation R = Rx(tiltX)·Ry(tiltY) and translated to (x, y, z).
 */
export class PairScene {
  private readonly renderer: WebGLRenderer;
  private readonly scene = new Scene();
  private readonly camera = new PerspectiveCamera(35, 1, 0.1, 1e5);
  private readonly controls: OrbitControls;
  private readonly txGroup = new Group();
  private readonly rxGroup = new Group();
  private readonly helpers = new Group();
  private readonly resizeObserver: ResizeObserver;
  private frame = 0;
  private span = 50;
  private preset: ViewPreset = 'iso';

  constructor(
    private readonly host: HTMLElement,
    private readonly colours: SceneColours,
  ) {
    this.renderer = new WebGLRenderer({ antialias: true, alpha: true });
    this.renderer.setPixelRatio(Math.min(window.devicePixelRatio || 1, 2));
    this.renderer.domElement.setAttribute('aria-hidden', 'true');
    host.appendChild(this.renderer.domElement);
    this.camera.up.set(0, 0, 1);
    this.controls = new OrbitControls(this.camera, this.renderer.domElement);
    this.controls.addEventListener('change', () => this.requestRender());
    this.rxGroup.matrixAutoUpdate = false;
    this.scene.add(this.txGroup, this.rxGroup, this.helpers);
    this.scene.add(new HemisphereLight(0xffffff, 0x445566, 1.6), new AmbientLight(0xffffff, 0.4));
    const sun = new DirectionalLight(0xffffff, 2.2);
    sun.position.set(0.6, -1, 1.6);
    this.scene.add(sun);
    this.resizeObserver = new ResizeObserver(() => this.resize());
    this.resizeObserver.observe(host);
    this.resize();
  }

  /** Replaces both coils (a new pair), and frames them. */
  setPair(drawing: PairDrawing): void {
    this.clear(this.txGroup);
    this.clear(this.rxGroup);
    this.clear(this.helpers);
    this.span = drawing.span * MM;
    this.build(this.txGroup, drawing.tx, this.colours.tx);
    this.build(this.rxGroup, drawing.rx, this.colours.rx);
    this.addHelpers(drawing.gridStep * MM);
    this.camera.near = this.span / 200;
    this.camera.far = this.span * 200;
    this.controls.minDistance = this.span / 20;
    this.controls.maxDistance = this.span * 40;
    this.setView(this.preset);
  }

  setPose(pose: StudyPose): void {
    this.rxGroup.matrix.copy(rxMatrix(pose, MM));
    this.rxGroup.matrixWorldNeedsUpdate = true;
    this.requestRender();
  }

  /** Puts the camera on a preset direction around the pair, at a distance that frames it. */
  setView(preset: ViewPreset): void {
    this.preset = preset;
    const d = this.span * 2.6;
    const direction =
      preset === 'top'
        ? new Vector3(0, -1e-4, 1)
        : preset === 'side'
          ? new Vector3(0, -1, 0.0001)
          : new Vector3(0.62, -0.9, 0.62);
    this.controls.target.set(0, 0, this.span * 0.15);
    this.camera.position.copy(this.controls.target).addScaledVector(direction.normalize(), d);
    this.camera.updateProjectionMatrix();
    this.controls.update();
    this.requestRender();
  }

  resize(): void {
    const width = Math.max(1, this.host.clientWidth);
    const height = Math.max(1, this.host.clientHeight);
    this.renderer.setSize(width, height, false);
    this.renderer.domElement.style.width = '100%';
    this.renderer.domElement.style.height = '100%';
    this.camera.aspect = width / height;
    this.camera.updateProjectionMatrix();
    this.requestRender();
  }

  dispose(): void {
    cancelAnimationFrame(this.frame);
    this.resizeObserver.disconnect();
    this.controls.dispose();
    for (const group of [this.txGroup, this.rxGroup, this.helpers]) this.clear(group);
    this.renderer.dispose();
    this.renderer.domElement.remove();
  }

  /** One render on the next frame, however many changes came in before it. */
  private requestRender(): void {
    if (this.frame) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = 0;
      this.renderer.render(this.scene, this.camera);
    });
  }

  private build(group: Group, coil: CoilDrawing, colour: string): void {
    const rings = coil.tubes.filter((t) => t.kind === 'circle').length;
    const tubular = Math.max(24, Math.min(128, Math.floor(RING_VERTEX_BUDGET / (9 * rings || 1))));
    const pieces = coil.tubes
      .map((tube) => tubeGeometry(tube, tubular))
      .filter((g) => g.getAttribute('position') !== undefined);
    if (pieces.length) {
      const merged = mergeGeometries(pieces, false);
      pieces.forEach((g) => g.dispose());
      const copper = new MeshStandardMaterial({
        color: new Color(colour),
        metalness: 0.55,
        roughness: 0.38,
      });
      group.add(new Mesh(merged ?? new BufferGeometry(), copper));
    }
    if (coil.slab) {
      const { center, size } = coil.slab;
      const slab = new Mesh(
        new BoxGeometry(size.x * MM, size.y * MM, size.z * MM),
        new MeshStandardMaterial({
          color: new Color(this.colours.ferrite),
          roughness: 0.92,
          metalness: 0.05,
          transparent: true,
          opacity: 0.88,
        }),
      );
      slab.position.set(center.x * MM, center.y * MM, center.z * MM);
      group.add(slab);
    }
  }

  /** The Tx frame's axes and a grid in its plane, sized to the pair. */
  private addHelpers(cell: number): void {
    const axes = new AxesHelper(this.span * 0.6);
    const grid = new GridHelper(cell * 20, 20, this.colours.grid, this.colours.grid);
    grid.rotateX(Math.PI / 2);
    (grid.material as Material).transparent = true;
    (grid.material as Material).opacity = 0.45;
    this.helpers.add(axes, grid);
  }

  private clear(group: Group): void {
    for (const child of [...group.children]) {
      child.traverse((node) => {
        const mesh = node as Mesh;
        mesh.geometry?.dispose();
        const material = mesh.material as Material | Material[] | undefined;
        if (Array.isArray(material)) material.forEach((m) => m.dispose());
        else material?.dispose();
      });
      group.remove(child);
    }
  }
}

/** One winding turn as geometry in scene units (mm). */
function tubeGeometry(tube: WindingTube, tubular: number): BufferGeometry {
  if (tube.kind === 'polyline') {
    const points = tube.points.map((p) => new Vector3(p.x * MM, p.y * MM, p.z * MM));
    return polylineTube(points, tube.closed, tube.tubeRadius * MM);
  }
  const torus = new TorusGeometry(tube.radius * MM, tube.tubeRadius * MM, 8, tubular);
  const turn = new Quaternion().setFromUnitVectors(
    new Vector3(0, 0, 1),
    new Vector3(tube.normal.x, tube.normal.y, tube.normal.z).normalize(),
  );
  const place = new Matrix4().compose(
    new Vector3(tube.center.x * MM, tube.center.y * MM, tube.center.z * MM),
    turn,
    new Vector3(1, 1, 1),
  );
  // Torus geometry is indexed with uv; the polyline tube has no uv: drop it so they merge.
  torus.deleteAttribute('uv');
  return torus.applyMatrix4(place);
}

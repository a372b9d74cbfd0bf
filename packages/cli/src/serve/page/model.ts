// The 3D view (three.js): the placed parts from the server (sceneMeshes.ts),
// preview.svg laid on the plate's top, the shadow on it, and the sun.
import * as THREE from 'three';
import { OrbitControls } from 'three/addons/controls/OrbitControls.js';
import type { SunView } from '../sunView.ts';
import type { View } from './api.ts';
import { byId } from './dom.ts';
import { emit } from './events.ts';

/** Everything the 3D view holds once WebGL has started. */
interface ModelView {
  readonly host: HTMLElement;
  readonly renderer: THREE.WebGLRenderer;
  readonly scene: THREE.Scene;
  readonly camera: THREE.PerspectiveCamera;
  readonly controls: OrbitControls;
  readonly light: THREE.DirectionalLight;
  readonly sun: { readonly ball: THREE.Mesh; readonly ray: THREE.Line };
  /** a render is asked for on the next frame */
  pending: boolean;
  /** the camera was framed on the first assembly (later builds keep the user's view) */
  framed: boolean;
  /** the shown build's parts and the shadow mesh on its face, with the assembly's centre and radius */
  shown: { readonly parts: THREE.Group; shadow: THREE.Mesh; readonly centre: THREE.Vector3; readonly radius: number } | null;
}

let view: ModelView | null = null;

/** Start the 3D view in #model; without WebGL, say so there and draw nothing. */
export function initModel(): void {
  const host = byId('model', HTMLElement);
  let renderer: THREE.WebGLRenderer;
  try {
    renderer = new THREE.WebGLRenderer({ antialias: true, alpha: true, preserveDrawingBuffer: true });
    renderer.setClearColor(0x000000, 0);
  } catch {
    const p = document.createElement('p');
    p.className = 'nogl';
    p.textContent = 'The 3D view needs WebGL, which this browser does not offer.';
    host.append(p);
    return;
  }
  emit({ type: 'webgl' });
  renderer.setPixelRatio(Math.min(2, window.devicePixelRatio || 1));
  host.append(renderer.domElement);
  const scene = new THREE.Scene();
  const camera = new THREE.PerspectiveCamera(35, 1, 1, 20000);
  camera.up.set(0, 0, 1);
  const controls = new OrbitControls(camera, renderer.domElement);
  controls.enableDamping = false;
  controls.addEventListener('change', render);
  scene.add(new THREE.HemisphereLight(0xf4f1ea, 0x6b6355, 1.4));
  const light = new THREE.DirectionalLight(0xfff2d6, 2.2);
  scene.add(light, light.target);
  // Level ground: a grid on Z = 0 (world X east, Y north, Z up) and compass letters.
  const grid = new THREE.GridHelper(1000, 20, 0x9a9284, 0xc9c1b0);
  grid.rotation.x = Math.PI / 2;
  scene.add(grid);
  for (const [letter, x, y] of [['N', 0, 1], ['E', 1, 0], ['S', 0, -1], ['W', -1, 0]] as const) {
    const s = textSprite(letter);
    s.position.set(x * 470, y * 470, 1);
    scene.add(s);
  }
  const ball = new THREE.Mesh(new THREE.SphereGeometry(7, 24, 16), new THREE.MeshBasicMaterial({ color: 0xf2b33d }));
  const ray = new THREE.Line(new THREE.BufferGeometry(), new THREE.LineDashedMaterial({ color: 0xc98a1a, dashSize: 8, gapSize: 6 }));
  scene.add(ball, ray);
  view = { host, renderer, scene, camera, controls, light, sun: { ball, ray }, pending: false, framed: false, shown: null };
  new ResizeObserver(resizeModel).observe(host);
  resizeModel();
}

function textSprite(text: string): THREE.Sprite {
  const c = document.createElement('canvas');
  c.width = c.height = 64;
  const g = c.getContext('2d');
  if (g) {
    g.fillStyle = '#2f4858';
    g.font = 'bold 44px sans-serif';
    g.textAlign = 'center';
    g.textBaseline = 'middle';
    g.fillText(text, 32, 34);
  }
  const s = new THREE.Sprite(new THREE.SpriteMaterial({ map: new THREE.CanvasTexture(c), depthTest: false }));
  s.scale.set(36, 36, 1);
  return s;
}

function resizeModel(): void {
  if (!view) return;
  const w = Math.max(50, view.host.clientWidth);
  const h = Math.max(50, view.host.clientHeight);
  view.renderer.setSize(w, h, false);
  view.camera.aspect = w / h;
  view.camera.updateProjectionMatrix();
  render();
}

/** Draw the 3D view on the next frame (several changes in one frame cost one render: WebGL may run on the CPU). */
function render(): void {
  if (!view || view.pending) return;
  const v = view;
  v.pending = true;
  requestAnimationFrame(() => {
    v.pending = false;
    v.renderer.render(v.scene, v.camera);
  });
}

const PART_LOOK: Readonly<Record<string, THREE.MeshStandardMaterialParameters>> = {
  wedge: { color: 0xb9c4c9, roughness: 0.9 },
  pillar: { color: 0xa59d90, roughness: 0.95 },
  wall: { color: 0xd8cfbd, roughness: 0.95 },
  mount: { color: 0x9ba4aa, roughness: 0.5, metalness: 0.4 },
  stand: { color: 0xc4c6c8, roughness: 0.6, metalness: 0.3 },
  fixings: { color: 0x787c82, roughness: 0.4, metalness: 0.6 },
  plate: { color: 0xd9d4c7, roughness: 0.55, metalness: 0.25 },
  gnomon: { color: 0x8d6a4f, roughness: 0.6, metalness: 0.2 },
};

function dispose(group: THREE.Object3D): void {
  group.traverse((o) => {
    if (!(o instanceof THREE.Mesh)) return;
    o.geometry.dispose();
    for (const m of Array.isArray(o.material) ? o.material : [o.material]) {
      if (m instanceof THREE.MeshStandardMaterial || m instanceof THREE.MeshBasicMaterial) m.map?.dispose();
      m.dispose();
    }
  });
}

/** Show a build's parts, its face and an empty shadow; the camera is framed on the first one. */
export function drawModel(r: View): void {
  if (!view) return;
  if (view.shown) {
    view.scene.remove(view.shown.parts);
    dispose(view.shown.parts);
  }
  const group = new THREE.Group();
  let triangles = 0;
  for (const m of r.scene.meshes) {
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.Float32BufferAttribute(m.positions as number[], 3));
    g.computeVertexNormals();
    triangles += m.positions.length / 9;
    const mesh = new THREE.Mesh(g, new THREE.MeshStandardMaterial({ ...(PART_LOOK[m.name] ?? { color: 0xcccccc }), flatShading: true, side: THREE.DoubleSide }));
    mesh.name = m.name;
    group.add(mesh);
  }
  // The face: preview.svg itself laid on the plate's top, and the shadow over it, in the face frame.
  const face = new THREE.Group();
  face.matrixAutoUpdate = false;
  face.matrix.fromArray(r.scene.faceToWorld as number[]);
  const fr = r.scene.faceRect;
  const plane = new THREE.Mesh(new THREE.PlaneGeometry(fr.widthMm, fr.lengthMm), new THREE.MeshStandardMaterial({ color: 0xffffff, roughness: 0.6, polygonOffset: true, polygonOffsetFactor: -1, polygonOffsetUnits: -2 }));
  plane.position.set(fr.x0 + fr.widthMm / 2, fr.y0 + fr.lengthMm / 2, 0);
  face.add(plane);
  faceTexture(r, plane);
  const shadow = new THREE.Mesh(new THREE.BufferGeometry(), new THREE.MeshBasicMaterial({ color: 0x1d2b35, transparent: true, opacity: 0.5, depthWrite: false, polygonOffset: true, polygonOffsetFactor: -2, polygonOffsetUnits: -4 }));
  face.add(shadow);
  group.add(face);
  view.scene.add(group);
  // Frame the camera once, on the whole assembly.
  const box = new THREE.Box3().setFromObject(group);
  const centre = box.getCenter(new THREE.Vector3());
  const radius = box.getSize(new THREE.Vector3()).length() / 2;
  view.shown = { parts: group, shadow, centre, radius };
  if (!view.framed) {
    view.controls.target.copy(centre);
    view.camera.position.copy(centre).add(new THREE.Vector3(0.9, -1.7, 1.1).normalize().multiplyScalar(radius * 3.2));
    view.camera.near = radius / 50;
    view.camera.far = radius * 60;
    view.camera.updateProjectionMatrix();
    view.controls.update();
    view.framed = true;
  }
  emit({ type: 'modelDrawn', triangles });
  render();
}

/** preview.svg drawn into a texture for the plate's top (only the plate's own rectangle, at its true proportions). */
function faceTexture(r: View, plane: THREE.Mesh<THREE.PlaneGeometry, THREE.MeshStandardMaterial>): void {
  const img = new Image();
  const url = URL.createObjectURL(new Blob([r.svg], { type: 'image/svg+xml' }));
  img.onload = () => {
    const fr = r.frame;
    const scale = Math.min(6, 1200 / fr.viewWidthMm);
    const c = document.createElement('canvas');
    c.width = Math.round(fr.plateWidthMm * scale);
    c.height = Math.round(fr.plateLengthMm * scale);
    c.getContext('2d')?.drawImage(img, -fr.padMm * scale, -fr.padMm * scale, fr.viewWidthMm * scale, fr.viewHeightMm * scale);
    URL.revokeObjectURL(url);
    const tex = new THREE.CanvasTexture(c);
    tex.colorSpace = THREE.SRGBColorSpace;
    tex.anisotropy = 4;
    plane.material.map = tex;
    plane.material.needsUpdate = true;
    render();
  };
  img.src = url;
}

/** The sun's ball, ray and light, and the shadow polygons (face coordinates, from the server) on the face; null: no sun to show. */
export function drawSun3d(s: SunView | null): void {
  if (!view || !view.shown) return;
  const { centre, radius } = view.shown;
  const up = s !== null && s.state !== 'below';
  view.sun.ball.visible = up;
  view.sun.ray.visible = up;
  if (s) {
    const dir = new THREE.Vector3(...s.sunWorld);
    const far = centre.clone().add(dir.clone().multiplyScalar(radius * 1.05));
    view.sun.ball.position.copy(far);
    view.sun.ray.geometry.setFromPoints([centre, far]);
    view.sun.ray.computeLineDistances();
    view.light.position.copy(centre.clone().add(dir.clone().multiplyScalar(1000)));
    view.light.target.position.copy(centre);
    view.light.intensity = up ? 2.2 : 0.15;
  }
  const g = new THREE.BufferGeometry();
  const pos: number[] = [];
  for (const poly of s?.shadowFace ?? []) {
    const tri = new THREE.ShapeGeometry(new THREE.Shape(poly.map(([x, y]) => new THREE.Vector2(x, y))));
    const p = tri.getAttribute('position');
    const idx = tri.getIndex();
    if (idx) for (let i = 0; i < idx.count; i++) pos.push(p.getX(idx.getX(i)), p.getY(idx.getX(i)), 0.02);
    tri.dispose();
  }
  g.setAttribute('position', new THREE.Float32BufferAttribute(pos, 3));
  emit({ type: 'shadow3d', triangles: pos.length / 9 });
  view.shown.shadow.geometry.dispose();
  view.shown.shadow.geometry = g;
  render();
}

// umbrafab dial page. The page only draws: every number, the face SVG, the
// meshes and the shadow come from the local server, which runs the same
// geometry and fabricate code as the CLI. No solar or layout math lives here.
import * as THREE from 'three';
import { OrbitControls } from 'three/addons/controls/OrbitControls.js';

const $ = (id) => document.getElementById(id);
const SVG_NS = 'http://www.w3.org/2000/svg';

/** Test and timing hooks: read by the browser test and the screenshot script. */
const probe = {
  ready: false,
  loadMs: null,
  redraws: 0,
  lastRedrawMs: null,
  builds: 0,
  suns: 0,
  webgl: false,
  triangles: 0,
  lastError: null,
};
window.umbrafab = probe;

const state = {
  fields: [],
  values: {},
  initial: {},
  build: null,
  /** fields whose default follows another field: {value, follows, rule}, from the server */
  derived: {},
  sun: null,
  seq: 0,
  sunSeq: 0,
  timer: 0,
  sunTimer: 0,
  changeAt: null,
};

// ---------------------------------------------------------------- server calls

async function post(path, body) {
  const res = await fetch(path, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) });
  const json = await res.json().catch(() => ({ ok: false, error: { field: null, message: `${res.status} ${res.statusText}` } }));
  return json;
}

function setStatus(text, kind) {
  const s = $('status');
  s.textContent = text;
  s.className = `status ${kind}`;
}

// ---------------------------------------------------------------- the form

function sectionTitle(key) {
  return key === '' ? 'dial' : key;
}

function renderForm() {
  const form = $('form');
  form.textContent = '';
  const groups = new Map();
  for (const f of state.fields) {
    const top = f.key.includes('.') ? f.key.split('.')[0] : '';
    if (!groups.has(top)) groups.set(top, []);
    groups.get(top).push(f);
  }
  // Top-level fields (name) join the first section.
  const order = [...groups.keys()];
  const openByDefault = new Set(['', 'site', 'dial', 'gnomon', 'hours']);
  for (const top of order) {
    const det = document.createElement('details');
    det.className = 'section';
    det.open = openByDefault.has(top);
    const sum = document.createElement('summary');
    sum.textContent = top === '' ? 'name' : sectionTitle(top);
    det.append(sum);
    for (const f of groups.get(top)) det.append(renderField(f));
    form.append(det);
  }
}

function fieldId(key) {
  return `f-${key.replace(/\./g, '-')}`;
}

function renderField(f) {
  const wrap = document.createElement('div');
  wrap.className = 'field';
  wrap.dataset.key = f.key;
  const label = document.createElement('label');
  label.htmlFor = fieldId(f.key);
  label.textContent = f.key.split('.').slice(f.section.split('.').length > 1 ? 1 : f.section ? 1 : 0).join('.');
  if (f.unit) {
    const u = document.createElement('span');
    u.className = 'unit';
    u.textContent = f.unit;
    label.append(u);
  }
  label.title = f.description;
  wrap.append(label);

  const v = state.values[f.key];
  let input;
  if (f.kind === 'choice') {
    input = document.createElement('select');
    if (f.default === undefined) input.append(new Option(f.required ? '— choose —' : f.derived ? '— derived —' : '— default —', ''));
    for (const c of f.choices) input.append(new Option(String(c), String(c)));
    input.value = String(v);
  } else if (f.kind === 'boolean') {
    input = document.createElement('input');
    input.type = 'checkbox';
    input.checked = v === true;
  } else {
    input = document.createElement('input');
    const numeric = f.kind === 'number' || f.kind === 'integer';
    input.type = numeric ? 'number' : 'text';
    if (numeric) {
      input.step = f.kind === 'integer' ? '1' : 'any';
      if (f.min !== undefined) input.min = String(f.min);
      if (f.max !== undefined) input.max = String(f.max);
    }
    if (f.derived) input.placeholder = 'derived';
    else if (f.kind === 'numberOrAuto') input.placeholder = `${f.default ?? 'auto'} or a number`;
    else if (f.default === undefined && !f.required) input.placeholder = 'default';
    input.value = v === undefined ? '' : String(v);
  }
  input.id = fieldId(f.key);
  input.name = f.key;
  input.addEventListener(f.kind === 'boolean' || f.kind === 'choice' ? 'change' : 'input', () => onFieldInput(f, input));
  wrap.append(input);

  if ((f.kind === 'number' || f.kind === 'integer') && Number.isFinite(f.min) && Number.isFinite(f.max)) {
    const range = document.createElement('input');
    range.type = 'range';
    range.min = String(f.min);
    range.max = String(f.max);
    range.step = f.kind === 'integer' ? '1' : 'any';
    range.value = String(v === '' ? f.default ?? f.min : v);
    range.setAttribute('aria-label', `${f.key} slider`);
    range.addEventListener('input', () => {
      input.value = String(Number(Number(range.value).toPrecision(6)));
      onFieldInput(f, input);
    });
    input.addEventListener('input', () => {
      if (input.value !== '') range.value = input.value;
    });
    wrap.append(range);
  }

  const help = document.createElement('small');
  const dflt = f.derived ? '' : f.default === undefined ? (f.required ? 'required' : 'optional') : `default ${typeof f.default === 'object' ? JSON.stringify(f.default) : f.default}${f.unit && typeof f.default === 'number' ? ` ${f.unit}` : ''}`;
  help.textContent = `${f.description}${f.description && dflt ? ' · ' : ''}${dflt}`;
  wrap.append(help);
  if (f.derived) {
    // A default that follows other fields: shown, never written back (left empty, the build derives it as `umbrafab build` does).
    const d = document.createElement('small');
    d.className = 'derived';
    wrap.append(d);
  }
  const err = document.createElement('p');
  err.className = 'err';
  err.hidden = true;
  wrap.append(err);
  return wrap;
}

/** Show each derived field's current value and what it follows (empty inputs only; a typed value is the user's). */
function drawDerived(derived) {
  state.derived = derived || {};
  for (const f of state.fields) {
    if (!f.derived) continue;
    const wrap = document.querySelector(`.field[data-key="${CSS.escape(f.key)}"]`);
    if (!wrap) continue;
    const d = state.derived[f.key];
    const now = d && d.value !== undefined ? `${d.value}${f.unit && typeof d.value === 'number' ? ` ${f.unit}` : ''}` : null;
    const input = wrap.querySelector('input:not([type=range]), select');
    if (input && input.tagName === 'INPUT') input.placeholder = now === null ? 'derived' : `${now} (derived)`;
    const note = wrap.querySelector('.derived');
    const set = state.values[f.key] !== '' && state.values[f.key] !== undefined;
    const range = wrap.querySelector('input[type=range]');
    if (range && !set && d && typeof d.value === 'number') range.value = String(d.value);
    note.textContent = `${set ? 'set here; when empty: ' : 'derived: '}${now === null ? '' : `${now} now, `}follows ${f.derived.follows.join(', ')} (${f.derived.rule})`;
  }
}

function readInput(f, input) {
  if (f.kind === 'boolean') return input.checked;
  if ((f.kind === 'number' || f.kind === 'integer') && input.value !== '' && Number.isFinite(Number(input.value))) return Number(input.value);
  return input.value;
}

function onFieldInput(f, input) {
  state.values[f.key] = readInput(f, input);
  input.closest('.field').classList.toggle('changed', String(state.values[f.key]) !== String(state.initial[f.key]));
  state.changeAt ??= performance.now();
  clearTimeout(state.timer);
  state.timer = setTimeout(rebuild, 60);
}

function showFieldError(error) {
  for (const el of document.querySelectorAll('.field.bad')) {
    el.classList.remove('bad');
    const e = el.querySelector('.err');
    e.hidden = true;
    e.textContent = '';
  }
  const box = $('spec-error');
  if (!error) {
    box.hidden = true;
    return;
  }
  box.hidden = false;
  box.textContent = `umbrafab: ${error.message}`;
  const el = error.field ? document.querySelector(`.field[data-key="${CSS.escape(error.field)}"]`) : null;
  if (el) {
    el.classList.add('bad');
    const e = el.querySelector('.err');
    e.hidden = false;
    e.textContent = error.message;
    const det = el.closest('details');
    if (det) det.open = true;
  }
}

// ---------------------------------------------------------------- build and draw

async function rebuild() {
  const seq = ++state.seq;
  setStatus('building…', 'busy');
  const t = { start: performance.now() };
  // The views and the sun for the same spec, asked for together.
  const sunSeq = ++state.sunSeq;
  const sunAnswer = post('/api/sun', { fields: state.values, ...sunQuery() });
  const r = await post('/api/view', { fields: state.values });
  t.view = performance.now();
  if (seq !== state.seq) return;
  probe.builds++;
  if (!r.ok) {
    probe.lastError = r.error;
    showFieldError(r.error);
    $('face').classList.add('stale');
    $('model').classList.add('stale');
    setStatus('the spec has a problem (see the form)', 'bad');
    finishRedraw();
    return;
  }
  probe.lastError = null;
  showFieldError(null);
  state.build = r;
  document.body.dataset.view = r.id;
  $('face').classList.remove('stale');
  $('model').classList.remove('stale');
  drawFace(r);
  drawNumbers(r);
  drawDerived(r.derived);
  t.face = performance.now();
  drawModel(r);
  t.model = performance.now();
  await showSun(await sunAnswer, sunSeq);
  t.sun = performance.now();
  probe.timings = { waitMs: state.changeAt === null ? 0 : t.start - state.changeAt, viewRequestMs: t.view - t.start, faceMs: t.face - t.view, modelMs: t.model - t.face, sunMs: t.sun - t.model };
  state.sunDrawnAt = t.sun;
  if (seq !== state.seq) return;
  setStatus('views up to date', 'good');
  // The full build (every file, about a second) once the fields are still for a moment.
  $('files').textContent = '';
  $('files-state').textContent = 'building the files…';
  clearTimeout(state.filesTimer);
  state.filesTimer = setTimeout(() => loadFiles(r.filesUrl, seq), 800);
}

async function loadFiles(url, seq) {
  const res = await fetch(url);
  const r = await res.json().catch(() => ({ ok: false, error: { message: `${res.status} ${res.statusText}` } }));
  if (seq !== state.seq) return;
  if (!r.ok) {
    $('files-state').textContent = '';
    showFieldError(r.error);
    setStatus('the full build failed (see the form)', 'bad');
    return;
  }
  drawFiles(r);
  const total = r.files.reduce((s, f) => s + f.bytes, 0);
  $('files-state').textContent = `${r.files.length} files, ${(total / 1024).toFixed(1)} KiB`;
  probe.filesReady = r.id;
  document.body.dataset.files = r.id;
}

function finishRedraw() {
  // Two animation frames: the browser has laid out and painted the new views.
  requestAnimationFrame(() =>
    requestAnimationFrame(() => {
      if (state.changeAt !== null) {
        probe.lastRedrawMs = performance.now() - state.changeAt;
        if (probe.timings) probe.timings.paintMs = performance.now() - (state.sunDrawnAt ?? performance.now());
        state.changeAt = null;
      }
      probe.redraws++;
      document.body.dataset.redraws = String(probe.redraws);
    }),
  );
}

function drawFace(r) {
  const face = $('face');
  const text = r.svg.replace(/^<\?xml[^>]*>\s*/, '');
  const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
  const svg = document.importNode(doc.documentElement, true);
  const fr = r.frame;
  // Shadow layer, clipped to the plate, in the SVG's own user units (mm).
  const defs = document.createElementNS(SVG_NS, 'defs');
  const clip = document.createElementNS(SVG_NS, 'clipPath');
  clip.id = 'plate-clip';
  const rect = document.createElementNS(SVG_NS, 'rect');
  rect.setAttribute('x', fr.padMm);
  rect.setAttribute('y', fr.padMm);
  rect.setAttribute('width', fr.plateWidthMm);
  rect.setAttribute('height', fr.plateLengthMm);
  clip.append(rect);
  defs.append(clip);
  const layer = document.createElementNS(SVG_NS, 'g');
  layer.id = 'shadow-layer';
  layer.setAttribute('clip-path', 'url(#plate-clip)');
  const path = document.createElementNS(SVG_NS, 'path');
  path.id = 'shadow';
  path.setAttribute('fill', '#2f4858');
  path.setAttribute('fill-opacity', '0.42');
  path.setAttribute('stroke', 'none');
  layer.append(path);
  svg.append(defs, layer);
  face.textContent = '';
  face.append(svg);
  face.classList.toggle('fit', !$('one-to-one').checked);
  updateScale();
}

function updateScale() {
  const svg = $('face').querySelector('svg');
  if (!svg || !state.build) return;
  const pxPerMm = svg.getBoundingClientRect().width / state.build.frame.viewWidthMm;
  $('scale').textContent = `1 mm = ${pxPerMm.toFixed(3)} px`;
  probe.pxPerMm = pxPerMm;
}

function drawNumbers(r) {
  const dl = $('numbers');
  dl.textContent = '';
  for (const row of r.summary) {
    const dt = document.createElement('dt');
    dt.textContent = row.label;
    const dd = document.createElement('dd');
    dd.textContent = row.value;
    dd.dataset.key = row.key;
    dl.append(dt, dd);
  }
  const notes = $('notes');
  notes.textContent = '';
  for (const n of r.notes) {
    const li = document.createElement('li');
    li.textContent = n;
    notes.append(li);
  }
}

function drawFiles(r) {
  const ul = $('files');
  ul.textContent = '';
  for (const f of r.files) {
    const li = document.createElement('li');
    const a = document.createElement('a');
    a.href = f.url;
    a.download = f.name;
    a.dataset.file = f.name;
    a.textContent = f.name;
    const size = document.createElement('span');
    size.textContent = f.bytes < 2048 ? `${f.bytes} B` : `${(f.bytes / 1024).toFixed(1)} KiB`;
    a.append(size);
    li.append(a);
    ul.append(li);
  }
}

// ---------------------------------------------------------------- the sun

function sunQuery() {
  return { date: $('sun-date').value, time: $('sun-time').value.slice(0, 5), kind: $('sun-kind').value };
}

async function refreshSun() {
  if (!state.build) return;
  const seq = ++state.sunSeq;
  await showSun(await post('/api/sun', { fields: state.values, ...sunQuery() }), seq);
}

async function showSun(r, seq) {
  if (seq !== state.sunSeq) return;
  probe.suns++;
  if (!r.ok) {
    $('sun-state').textContent = `umbrafab: ${r.error.message}`;
    drawShadow([]);
    drawSun3d(null);
    finishRedraw();
    return;
  }
  state.sun = r;
  probe.sun = r.sun;
  drawShadow(r.shadowPreview);
  drawSun3d(r.sun);
  drawSunNumbers(r.sun);
  finishRedraw();
}

function drawShadow(polys) {
  const path = document.getElementById('shadow');
  if (!path) return;
  const d = polys.map((p) => p.map(([x, y], i) => `${i ? 'L' : 'M'}${x.toFixed(4)} ${y.toFixed(4)}`).join(' ') + ' Z').join(' ');
  path.setAttribute('d', d || 'M0 0');
  path.style.display = d ? '' : 'none';
}

function drawSunNumbers(s) {
  const words = { lit: 'the sun is on the face', behind: 'the sun is behind the face', below: 'the sun is below the horizon' };
  $('sun-state').textContent = `${words[s.state]} · ${s.query.date} · apparent ${s.apparent} · clock ${s.clock}${s.daylightSaving ? ' (summer time)' : ''}`;
  const rows = [
    ['hour angle', `${s.hourAngleDeg.toFixed(3)}°`],
    ['declination', `${s.declinationDeg.toFixed(3)}°`],
    ['altitude', `${s.altitudeDeg.toFixed(2)}°`],
    ['local clock', `${s.clock}${s.daylightSaving ? ' summer' : ''}`],
    ['apparent solar', s.apparent],
    ['UTC', s.utc.replace('T', ' ').replace(/\.\d+Z$/, 'Z')],
  ];
  const dl = $('sun-numbers');
  dl.textContent = '';
  for (const [k, v] of rows) {
    const dt = document.createElement('dt');
    dt.textContent = k;
    const dd = document.createElement('dd');
    dd.textContent = v;
    dl.append(dt, dd);
  }
}

function onSunInput(fromSlider) {
  if (fromSlider) {
    const m = Number($('sun-slider').value);
    $('sun-time').value = `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
  } else {
    const [h, m] = $('sun-time').value.split(':').map(Number);
    if (Number.isFinite(h) && Number.isFinite(m)) $('sun-slider').value = String(h * 60 + m);
  }
  state.changeAt ??= performance.now();
  clearTimeout(state.sunTimer);
  state.sunTimer = setTimeout(() => refreshSun(), 30);
}

// ---------------------------------------------------------------- the 3D view

const view = { renderer: null, scene: null, camera: null, controls: null, parts: null, face: null, shadow: null, sun: null, light: null, texture: null, framed: false };

function initModel() {
  const host = $('model');
  let renderer;
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
  probe.webgl = true;
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
  for (const [letter, x, y] of [['N', 0, 1], ['E', 1, 0], ['S', 0, -1], ['W', -1, 0]]) {
    const s = textSprite(letter);
    s.position.set(x * 470, y * 470, 1);
    scene.add(s);
  }
  const sun = new THREE.Mesh(new THREE.SphereGeometry(7, 24, 16), new THREE.MeshBasicMaterial({ color: 0xf2b33d }));
  const ray = new THREE.Line(new THREE.BufferGeometry(), new THREE.LineDashedMaterial({ color: 0xc98a1a, dashSize: 8, gapSize: 6 }));
  scene.add(sun, ray);
  Object.assign(view, { renderer, scene, camera, controls, light, sun: { ball: sun, ray } });
  new ResizeObserver(resizeModel).observe(host);
  resizeModel();
}

function textSprite(text) {
  const c = document.createElement('canvas');
  c.width = c.height = 64;
  const g = c.getContext('2d');
  g.fillStyle = '#2f4858';
  g.font = 'bold 44px sans-serif';
  g.textAlign = 'center';
  g.textBaseline = 'middle';
  g.fillText(text, 32, 34);
  const s = new THREE.Sprite(new THREE.SpriteMaterial({ map: new THREE.CanvasTexture(c), depthTest: false }));
  s.scale.set(36, 36, 1);
  return s;
}

function resizeModel() {
  if (!view.renderer) return;
  const host = $('model');
  const w = Math.max(50, host.clientWidth);
  const h = Math.max(50, host.clientHeight);
  view.renderer.setSize(w, h, false);
  view.camera.aspect = w / h;
  view.camera.updateProjectionMatrix();
  render();
}

/** Draw the 3D view on the next frame (several changes in one frame cost one render: WebGL may run on the CPU). */
function render() {
  if (!view.renderer || view.pending) return;
  view.pending = true;
  requestAnimationFrame(() => {
    view.pending = false;
    view.renderer.render(view.scene, view.camera);
  });
}

const PART_LOOK = {
  wedge: { color: 0xb9c4c9, roughness: 0.9 },
  plate: { color: 0xd9d4c7, roughness: 0.55, metalness: 0.25 },
  gnomon: { color: 0x8d6a4f, roughness: 0.6, metalness: 0.2 },
};

function drawModel(r) {
  if (!view.renderer) return;
  if (view.parts) {
    view.scene.remove(view.parts);
    view.parts.traverse((o) => {
      o.geometry?.dispose();
      o.material?.map?.dispose();
      o.material?.dispose();
    });
  }
  const group = new THREE.Group();
  let triangles = 0;
  for (const m of r.scene.meshes) {
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.Float32BufferAttribute(m.positions, 3));
    g.computeVertexNormals();
    triangles += m.positions.length / 9;
    const mesh = new THREE.Mesh(g, new THREE.MeshStandardMaterial({ ...(PART_LOOK[m.name] ?? { color: 0xcccccc }), flatShading: true }));
    mesh.name = m.name;
    group.add(mesh);
  }
  probe.triangles = triangles;
  // The face: preview.svg itself laid on the plate's top, and the shadow over it, in the face frame.
  const face = new THREE.Group();
  face.matrixAutoUpdate = false;
  face.matrix.fromArray(r.scene.faceToWorld);
  const fr = r.scene.faceRect;
  const plane = new THREE.Mesh(new THREE.PlaneGeometry(fr.widthMm, fr.lengthMm), new THREE.MeshStandardMaterial({ color: 0xffffff, roughness: 0.6, polygonOffset: true, polygonOffsetFactor: -1, polygonOffsetUnits: -2 }));
  plane.position.set(fr.x0 + fr.widthMm / 2, fr.y0 + fr.lengthMm / 2, 0);
  face.add(plane);
  faceTexture(r, plane);
  const shadow = new THREE.Mesh(new THREE.BufferGeometry(), new THREE.MeshBasicMaterial({ color: 0x1d2b35, transparent: true, opacity: 0.5, depthWrite: false, polygonOffset: true, polygonOffsetFactor: -2, polygonOffsetUnits: -4 }));
  face.add(shadow);
  group.add(face);
  view.scene.add(group);
  view.parts = group;
  view.shadow = shadow;
  view.faceFrame = new THREE.Matrix4().fromArray(r.scene.faceToWorld);
  // Frame the camera once, on the whole assembly.
  const box = new THREE.Box3().setFromObject(group);
  const centre = box.getCenter(new THREE.Vector3());
  const radius = box.getSize(new THREE.Vector3()).length() / 2;
  view.centre = centre;
  view.radius = radius;
  if (!view.framed) {
    view.controls.target.copy(centre);
    view.camera.position.copy(centre).add(new THREE.Vector3(0.9, -1.7, 1.1).normalize().multiplyScalar(radius * 3.2));
    view.camera.near = radius / 50;
    view.camera.far = radius * 60;
    view.camera.updateProjectionMatrix();
    view.controls.update();
    view.framed = true;
  }
  render();
}

function faceTexture(r, plane) {
  const img = new Image();
  const url = URL.createObjectURL(new Blob([r.svg], { type: 'image/svg+xml' }));
  img.onload = () => {
    const fr = r.frame;
    const scale = Math.min(6, 1200 / fr.viewWidthMm);
    const c = document.createElement('canvas');
    c.width = Math.round(fr.plateWidthMm * scale);
    c.height = Math.round(fr.plateLengthMm * scale);
    const g = c.getContext('2d');
    // Only the plate's own rectangle of the preview, at its true proportions.
    g.drawImage(img, -fr.padMm * scale, -fr.padMm * scale, fr.viewWidthMm * scale, fr.viewHeightMm * scale);
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

function drawSun3d(s) {
  if (!view.renderer || !view.parts) return;
  const dir = s ? new THREE.Vector3(...s.sunWorld) : null;
  const up = s && s.state !== 'below';
  view.sun.ball.visible = !!up;
  view.sun.ray.visible = !!up;
  if (dir && view.centre) {
    const far = view.centre.clone().add(dir.clone().multiplyScalar(view.radius * 1.05));
    view.sun.ball.position.copy(far);
    view.sun.ray.geometry.setFromPoints([view.centre, far]);
    view.sun.ray.computeLineDistances();
    view.light.position.copy(view.centre.clone().add(dir.clone().multiplyScalar(1000)));
    view.light.target.position.copy(view.centre);
    view.light.intensity = up ? 2.2 : 0.15;
  }
  // The shadow polygons (face coordinates, from the server) on the face.
  const g = new THREE.BufferGeometry();
  const pos = [];
  for (const poly of s?.shadowFace ?? []) {
    const shape = new THREE.Shape(poly.map(([x, y]) => new THREE.Vector2(x, y)));
    const tri = new THREE.ShapeGeometry(shape);
    const p = tri.getAttribute('position');
    const idx = tri.getIndex();
    for (let i = 0; i < idx.count; i++) pos.push(p.getX(idx.getX(i)), p.getY(idx.getX(i)), 0.02);
    tri.dispose();
  }
  g.setAttribute('position', new THREE.Float32BufferAttribute(pos, 3));
  probe.shadowTriangles3d = pos.length / 9;
  view.shadow.geometry.dispose();
  view.shadow.geometry = g;
  render();
}

// ---------------------------------------------------------------- save

async function save() {
  // First the list of changed fields, then the write once the user agrees.
  const preview = await post('/api/save', { fields: state.values, preview: true });
  if (!preview.ok) {
    showFieldError(preview.error.field ? preview.error : null);
    setStatus(`not saved: ${preview.error.message}`, 'bad');
    return;
  }
  showChanges(preview.changes);
  if (preview.changes.length === 0) {
    setStatus(`nothing changed: ${preview.file} left as it is`, 'good');
    return;
  }
}

/** The changed fields, listed before saving, with the buttons to save or go back. */
function showChanges(changes) {
  const box = $('changes');
  box.textContent = '';
  box.hidden = changes.length === 0;
  if (changes.length === 0) return;
  const head = document.createElement('p');
  head.textContent = `save writes ${changes.length} changed field${changes.length === 1 ? '' : 's'}; the rest of the file (comments, order, other fields) stays:`;
  const list = document.createElement('ul');
  for (const c of changes) {
    const li = document.createElement('li');
    li.textContent = c.text;
    li.dataset.key = c.key;
    list.append(li);
  }
  const ok = document.createElement('button');
  ok.type = 'button';
  ok.id = 'save-confirm';
  ok.textContent = 'save these changes';
  ok.addEventListener('click', confirmSave);
  const back = document.createElement('button');
  back.type = 'button';
  back.textContent = 'cancel';
  back.addEventListener('click', () => showChanges([]));
  box.append(head, list, ok, back);
}

async function confirmSave() {
  const r = await post('/api/save', { fields: state.values });
  showChanges([]);
  if (r.ok) {
    setStatus(r.written ? `saved ${r.changes.length} field${r.changes.length === 1 ? '' : 's'} to ${r.file}` : `nothing changed: ${r.file} left as it is`, 'good');
    state.initial = { ...state.values };
    for (const el of document.querySelectorAll('.field.changed')) el.classList.remove('changed');
    probe.saved = (probe.saved || 0) + 1;
  } else {
    showFieldError(r.error.field ? r.error : null);
    setStatus(`not saved: ${r.error.message}`, 'bad');
  }
}

// ---------------------------------------------------------------- start

async function start() {
  const t0 = performance.now();
  const setup = await (await fetch('/api/setup')).json();
  state.fields = setup.fields;
  state.values = { ...setup.values };
  state.initial = { ...setup.values };
  $('spec-file').textContent = setup.specFile ? setup.specFile : 'no spec file: save is off';
  $('save').disabled = !setup.canSave;
  if (!setup.canSave) $('save').title = 'start the server with a spec file (umbrafab serve my-dial.yaml) to save';
  renderForm();
  drawDerived(setup.derived);
  if (setup.initialError) showFieldError({ field: null, message: setup.initialError });
  const year = state.values['calendar.year'] || new Date().getFullYear();
  $('sun-date').value = `${year}-04-16`;
  $('sun-time').value = '14:30';
  $('sun-slider').value = String(14 * 60 + 30);
  $('sun-date').addEventListener('input', () => onSunInput(false));
  $('sun-time').addEventListener('input', () => onSunInput(false));
  $('sun-kind').addEventListener('change', () => onSunInput(false));
  $('sun-slider').addEventListener('input', () => onSunInput(true));
  $('one-to-one').addEventListener('change', () => {
    $('face').classList.toggle('fit', !$('one-to-one').checked);
    updateScale();
  });
  new ResizeObserver(updateScale).observe($('face'));
  $('save').addEventListener('click', save);
  initModel();
  await rebuild();
  await new Promise((ok) => requestAnimationFrame(() => requestAnimationFrame(ok)));
  probe.loadMs = performance.now() - t0;
  probe.navigationToReadyMs = performance.now();
  probe.ready = true;
  document.body.dataset.ready = 'true';
}

start().catch((e) => {
  setStatus(`the page could not start: ${e.message}`, 'bad');
  probe.lastError = { message: String(e) };
});

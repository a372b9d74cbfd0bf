// umbrafab dial page. The page only draws: every number, the face SVG, the
// meshes and the shadow come from the local server, which runs the same
// geometry and fabricate code as the CLI. No solar or layout math lives here.
//
// Modules: api (the server's routes, request lanes), state (the one state
// object), form, face (2D), model (3D, three.js), sun, panels (numbers and
// files), save, events (the hook an observer watches) and probe (the browser
// tests' observer, attached only for `/?probe`). This file wires them.
import { RequestLane, SUPERSEDED, debounced, serverApi, type Refusal, type Sun } from './api.ts';
import { byId, setStatus } from './dom.ts';
import { emit } from './events.ts';
import { drawFace, drawShadow, fitFace, markStale, updateScale } from './face.ts';
import { drawDerived, renderForm, showFieldError } from './form.ts';
import { drawModel, drawSun3d, initModel } from './model.ts';
import { drawFiles, drawNumbers, filesPending, setFilesState } from './panels.ts';
import { attachProbe } from './probe.ts';
import { save } from './save.ts';
import { state } from './state.ts';
import { drawSunNumbers, initSunControls, showSunProblem, sunQuery } from './sun.ts';

const api = serverApi();
/** Only the latest of each matters: a new one aborts the one in flight. */
const lanes = { view: new RequestLane(), sun: new RequestLane(), files: new RequestLane() };
/** The form waits for a pause in typing, the sun controls for a pause in dragging, the full build for the fields to be still a moment (it takes about a second). */
const wait = { form: debounced(() => void rebuild(), 60), sun: debounced(() => void refreshSun(), 30), files: debounced(() => void loadFiles(), 800) };

/** Ask for the views and the sun of the current fields together, draw them, then (after a pause) the file list. */
async function rebuild(): Promise<void> {
  wait.files.cancel();
  lanes.files.cancel();
  await lanes.view.run(async (signal) => {
    setStatus('building…', 'busy');
    emit({ type: 'viewAsked' });
    // The sun on its own lane: a sun change meanwhile takes over from this one.
    const sunAnswer = lanes.sun.run((s) => api.sun(state.values, sunQuery(), s));
    const r = await api.view(state.values, signal);
    if (signal.aborted) return;
    emit({ type: 'viewAnswered', id: r.ok ? r.id : null, error: r.ok ? null : r.error });
    if (!r.ok) {
      showFieldError(r.error);
      markStale(true);
      setStatus('the spec has a problem (see the form)', 'bad');
      emit({ type: 'drawn' });
      return;
    }
    showFieldError(null);
    state.build = r;
    markStale(false);
    drawFace(r);
    drawNumbers(r);
    drawDerived(r.derived);
    emit({ type: 'faceDrawn' });
    drawModel(r);
    const sun = await sunAnswer;
    if (sun !== SUPERSEDED) showSun(sun);
    if (signal.aborted) return;
    setStatus('views up to date', 'good');
    filesPending();
    wait.files.schedule();
  });
}

/** The full build's file list for the views on show. */
async function loadFiles(): Promise<void> {
  const url = state.build?.filesUrl;
  if (url === undefined) return;
  const r = await lanes.files.run((signal) => api.files(url, signal));
  if (r === SUPERSEDED) return;
  if (!r.ok) {
    setFilesState('');
    showFieldError(r.error);
    setStatus('the full build failed (see the form)', 'bad');
    return;
  }
  drawFiles(r);
  emit({ type: 'files', id: r.id });
}

/** The sun at the moment the controls show, for the views on show. */
async function refreshSun(): Promise<void> {
  if (!state.build) return;
  const r = await lanes.sun.run((s) => api.sun(state.values, sunQuery(), s));
  if (r !== SUPERSEDED) showSun(r);
}

function showSun(r: Sun | Refusal): void {
  if (!r.ok) {
    showSunProblem(r.error.message);
    drawShadow([]);
    drawSun3d(null);
  } else {
    drawShadow(r.shadowPreview);
    drawSun3d(r.sun);
    drawSunNumbers(r.sun);
  }
  emit({ type: 'sunShown', sun: r.ok ? r.sun : null });
  emit({ type: 'drawn' });
}

async function start(): Promise<void> {
  const setup = await api.setup();
  if (!setup.ok) throw new Error(setup.error.message);
  state.fields = setup.fields;
  state.values = { ...setup.values };
  state.initial = { ...setup.values };
  byId('spec-file', HTMLElement).textContent = setup.specFile ? setup.specFile : 'no spec file: save is off';
  const saveButton = byId('save', HTMLButtonElement);
  saveButton.disabled = !setup.canSave;
  if (!setup.canSave) saveButton.title = 'start the server with a spec file (umbrafab serve my-dial.yaml) to save';
  renderForm(() => {
    emit({ type: 'change' });
    wait.form.schedule();
  });
  drawDerived(setup.derived);
  if (setup.initialError) showFieldError({ field: null, message: setup.initialError });
  const year = String(state.values['calendar.year'] || new Date().getFullYear());
  initSunControls(year, () => {
    emit({ type: 'change' });
    wait.sun.schedule();
  });
  byId('one-to-one', HTMLInputElement).addEventListener('change', fitFace);
  new ResizeObserver(updateScale).observe(byId('face', HTMLElement));
  saveButton.addEventListener('click', () => void save(api));
  initModel();
  await rebuild();
  emit({ type: 'ready' });
}

if (new URLSearchParams(location.search).has('probe')) attachProbe();
start().catch((e: unknown) => {
  const message = e instanceof Error ? e.message : String(e);
  setStatus(`the page could not start: ${message}`, 'bad');
  emit({ type: 'failed', message: String(e) });
});

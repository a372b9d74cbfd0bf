// "save spec": first the list of changed fields from the server, then the
// write once the user agrees (the server edits only those fields' lines).
import type { ServerApi } from './api.ts';
import { byId, make, setStatus } from './dom.ts';
import { emit } from './events.ts';
import { markAllSaved, showFieldError } from './form.ts';
import { state } from './state.ts';

const plural = (n: number) => (n === 1 ? '' : 's');

/** Ask for the changes "save spec" would write and list them (or say nothing changed). */
export async function save(api: ServerApi): Promise<void> {
  const preview = await api.save(state.values, true);
  if (!preview.ok) {
    showFieldError(preview.error.field ? preview.error : null);
    setStatus(`not saved: ${preview.error.message}`, 'bad');
    return;
  }
  showChanges(api, preview.changes);
  if (preview.changes.length === 0) setStatus(`nothing changed: ${preview.file} left as it is`, 'good');
}

/** The changed fields, listed before saving, with the buttons to save or go back. */
function showChanges(api: ServerApi, changes: readonly { readonly key: string; readonly text: string }[]): void {
  const box = byId('changes', HTMLElement);
  box.textContent = '';
  box.hidden = changes.length === 0;
  if (changes.length === 0) return;
  const head = make('p', { text: `save writes ${changes.length} changed field${plural(changes.length)}; the rest of the file (comments, order, other fields) stays:` });
  const list = make('ul');
  for (const c of changes) {
    const li = make('li', { text: c.text });
    li.dataset.key = c.key;
    list.append(li);
  }
  const ok = make('button', { text: 'save these changes' });
  ok.type = 'button';
  ok.id = 'save-confirm';
  ok.addEventListener('click', () => void confirmSave(api));
  const back = make('button', { text: 'cancel' });
  back.type = 'button';
  back.addEventListener('click', () => showChanges(api, []));
  box.append(head, list, ok, back);
}

async function confirmSave(api: ServerApi): Promise<void> {
  const r = await api.save(state.values, false);
  showChanges(api, []);
  if (r.ok) {
    const written = 'written' in r && r.written;
    setStatus(written ? `saved ${r.changes.length} field${plural(r.changes.length)} to ${r.file}` : `nothing changed: ${r.file} left as it is`, 'good');
    markAllSaved();
    emit({ type: 'saved' });
  } else {
    showFieldError(r.error.field ? r.error : null);
    setStatus(`not saved: ${r.error.message}`, 'bad');
  }
}

// The numbers panel, the notes and the download list.
import type { FileList, View } from './api.ts';
import { byId, fillList, make } from './dom.ts';
import { fileSizeText, filesStateText } from './format.ts';

/** The build's key numbers (already formatted by the server) and its notes. */
export function drawNumbers(r: View): void {
  fillList(byId('numbers', HTMLElement), r.summary);
  const notes = byId('notes', HTMLElement);
  notes.textContent = '';
  for (const n of r.notes) notes.append(make('li', { text: n }));
}

/** The full build's files, each a download link with its size. */
export function drawFiles(r: FileList): void {
  const ul = byId('files', HTMLElement);
  ul.textContent = '';
  for (const f of r.files) {
    const a = make('a', { text: f.name });
    a.href = f.url;
    a.download = f.name;
    a.dataset.file = f.name;
    a.append(make('span', { text: fileSizeText(f.bytes) }));
    const li = make('li');
    li.append(a);
    ul.append(li);
  }
  byId('files-state', HTMLElement).textContent = filesStateText(r.files);
}

/** The list is being built: cleared, with a word. */
export function filesPending(): void {
  byId('files', HTMLElement).textContent = '';
  setFilesState('building the files…');
}

/** The line beside the download list's heading. */
export function setFilesState(text: string): void {
  byId('files-state', HTMLElement).textContent = text;
}

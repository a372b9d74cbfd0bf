// Small DOM helpers shared by the page's modules.

/** The element with this id in index.html, of the kind the page expects (a missing or different one is a bug, said loudly). */
export function byId<T extends Element>(id: string, kind: abstract new (...args: never[]) => T): T {
  const el = document.getElementById(id);
  if (!(el instanceof kind)) throw new Error(`the page has no #${id} of the expected kind`);
  return el;
}

/** The status line in the header bar. */
export function setStatus(text: string, kind: 'busy' | 'good' | 'bad'): void {
  const s = byId('status', HTMLElement);
  s.textContent = text;
  s.className = `status ${kind}`;
}

/** A new element with its class and text. */
export function make<K extends keyof HTMLElementTagNameMap>(tag: K, props: { className?: string; text?: string } = {}): HTMLElementTagNameMap[K] {
  const el = document.createElement(tag);
  if (props.className !== undefined) el.className = props.className;
  if (props.text !== undefined) el.textContent = props.text;
  return el;
}

/** Fill a <dl> with [term, value] rows; `key` marks a value for the tests and the screenshot script. */
export function fillList(dl: HTMLElement, rows: readonly { readonly label: string; readonly value: string; readonly key?: string }[]): void {
  dl.textContent = '';
  for (const row of rows) {
    const dd = make('dd', { text: row.value });
    if (row.key !== undefined) dd.dataset.key = row.key;
    dl.append(make('dt', { text: row.label }), dd);
  }
}

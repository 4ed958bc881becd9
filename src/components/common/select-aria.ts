/**
 * Keeps ant-design-vue's select boxes (4.2, the latest) valid ARIA comboboxes. A closed select that was never opened
 * omits aria-expanded and points aria-owns, aria-controls and aria-activedescendant at a list it renders only on
 * first open; screen readers then announce nothing and follow dead references. The library has no option for it,
 * so this watches the page: a missing aria-expanded is written as "false", a reference is kept only while its
 * element exists (and put back when it appears), and an aria-label set on the select's outer box names the input.
 */
const REFS = ['aria-owns', 'aria-controls', 'aria-activedescendant'] as const;
const SAVED = (a: string) => `data-lw-${a}`;
const SELECTOR = 'input.ant-select-selection-search-input[role="combobox"]';

function set(el: Element, name: string, value: string | null): void {
  if (value === null) {
    if (el.hasAttribute(name)) el.removeAttribute(name);
  } else if (el.getAttribute(name) !== value) el.setAttribute(name, value);
}

/** Repairs one combobox input; a no-op when it is already consistent (so the observer does not loop). */
export function repairCombobox(input: Element, doc: Document = document): void {
  if (!input.hasAttribute('aria-expanded')) input.setAttribute('aria-expanded', 'false');
  // An aria-label given to <a-select> lands on its outer box, not on the input that is the combobox.
  const named = input.hasAttribute('aria-label') || input.hasAttribute('aria-labelledby') || input.closest('label') || (input.id && [...doc.querySelectorAll('label[for]')].some((l) => l.getAttribute('for') === input.id));
  const outer = input.closest('.ant-select')?.getAttribute('aria-label');
  if (!named && outer) input.setAttribute('aria-label', outer);
  for (const name of REFS) {
    // The library's value wins when it sets one; otherwise the last one it set is remembered.
    const current = input.getAttribute(name);
    if (current !== null && current !== input.getAttribute(SAVED(name))) set(input, SAVED(name), current);
    const wanted = input.getAttribute(SAVED(name));
    set(input, name, wanted !== null && doc.getElementById(wanted) ? wanted : null);
  }
}

export function repairAll(doc: Document = document): void {
  doc.querySelectorAll(SELECTOR).forEach((el) => repairCombobox(el, doc));
}

/** Starts watching the document; returns a function that stops it. */
export function watchSelectAria(doc: Document = document): () => void {
  repairAll(doc);
  let queued = false;
  const observer = new MutationObserver(() => {
    if (queued) return;
    queued = true;
    queueMicrotask(() => {
      queued = false;
      repairAll(doc);
    });
  });
  observer.observe(doc.body, { subtree: true, childList: true, attributes: true, attributeFilter: ['aria-expanded', ...REFS] });
  return () => observer.disconnect();
}

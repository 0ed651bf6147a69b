// Client-side only: shows every copy button and copies on click: the text of its target element, or text fetched
// from its data-copy-href (fetched ahead, on pointer or keyboard approach, so that the click itself writes at once).
// The button says "Copied" (or why not) for a few seconds.
const cache = new Map<string, Promise<string>>();
const fetchText = (href: string) => {
  if (!cache.has(href)) cache.set(href, fetch(href).then((r) => (r.ok ? r.text() : Promise.reject(new Error(`HTTP ${r.status}`)))));
  return cache.get(href)!;
};

async function copy(button: HTMLButtonElement): Promise<void> {
  const done = button.querySelector('.copy-done');
  const say = (text: string) => {
    if (!done) return;
    done.textContent = text;
    setTimeout(() => { if (done.textContent === text) done.textContent = ''; }, 3000);
  };
  try {
    const target = button.dataset.copyTarget ? document.getElementById(button.dataset.copyTarget) : null;
    const text = target ? (target.textContent ?? '') : await fetchText(button.dataset.copyHref ?? '');
    await navigator.clipboard.writeText(text);
    say('Copied');
  } catch (error) {
    say(`Not copied (${(error as Error).message})`);
  }
}

for (const button of document.querySelectorAll<HTMLButtonElement>('button.copy-button')) {
  if (button.dataset.copyReady) continue;
  button.dataset.copyReady = 'true';
  button.hidden = false;
  button.addEventListener('click', () => void copy(button));
  const href = button.dataset.copyHref;
  if (href) for (const event of ['pointerenter', 'focus']) button.addEventListener(event, () => void fetchText(href).catch(() => undefined), { once: true });
}

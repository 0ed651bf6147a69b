// Client-side only: the <space-figure> custom element. The SVG inside is complete without JavaScript (the static
// sight); this lets the reader turn the figure: drag with the mouse (one finger sideways on touch screens, so the page
// still scrolls), arrow keys on the focused frame, the turn buttons, 0 or Home and a button to go back to the static
// sight, and layer toggles. It redraws from the page's copy of the figure (script.space-data) with the same pure
// modules the build used, and keeps the link to the solutions table. Sets data-ready when hydrated, data-turned
// while the sight differs from the static one.
import type { Sight } from '../atlas/space-figure.ts';
import type { SpacePayload } from '../plots/space-payload.ts';
import { sightGizmoMarkup, spaceSceneMarkup } from '../plots/space-svg.ts';
import { linkFigureToTable } from './figure-table-link.ts';

/** Degrees turned per key press or button, and per CSS px dragged. */
const KEY_STEP = 15, DRAG_RATE = 0.5;

const clampTilt = (t: number) => Math.max(-90, Math.min(90, t));
const round1 = (v: number) => Math.round(v * 10) / 10;
const normalTurn = (t: number) => round1(((t % 360) + 540) % 360 - 180);

class SpaceFigureElement extends HTMLElement {
  #payload: SpacePayload | null = null;
  #sight: Sight = { turn: 0, tilt: 0 };
  #hidden = new Set<string>();
  #svg: SVGSVGElement | null = null;
  #relink: () => void = () => undefined;
  #frame = 0;

  connectedCallback(): void {
    const svg = this.querySelector<SVGSVGElement>('svg.space-svg');
    const frame = this.querySelector<HTMLElement>('.figure-frame');
    const data = this.querySelector('script.space-data')?.textContent;
    if (!svg || !frame || !data) return;
    this.#payload = JSON.parse(data) as SpacePayload;
    this.#sight = { ...this.#payload.sight };
    this.#svg = svg;
    frame.tabIndex = 0;
    frame.setAttribute('role', 'group');
    frame.setAttribute('aria-label', 'Figure in space: arrow keys turn it, 0 goes back to the first view');
    frame.addEventListener('keydown', (e) => this.#key(e));
    this.#dragging(svg);
    for (const button of this.querySelectorAll<HTMLButtonElement>('button[data-turn-by]')) {
      button.addEventListener('click', () => this.#turnBy(Number(button.dataset.turnBy), Number(button.dataset.tiltBy), true));
    }
    this.querySelector('button[data-reset-view]')?.addEventListener('click', () => this.#reset());
    for (const button of this.querySelectorAll<HTMLButtonElement>('button[data-toggle-layer]')) {
      button.addEventListener('click', () => this.#toggle(button));
    }
    this.#relink = linkFigureToTable(this, svg);
    this.querySelector<HTMLElement>('.figure-tools')?.removeAttribute('hidden');
    this.setAttribute('data-ready', '');
  }

  /** Pointer drags turn (horizontal) and tilt (vertical) the figure; the pointer is captured for the drag. */
  #dragging(svg: SVGSVGElement): void {
    let last: [number, number] | null = null;
    svg.addEventListener('pointerdown', (e) => {
      if (e.button !== 0) return;
      last = [e.clientX, e.clientY];
      svg.setPointerCapture(e.pointerId);
    });
    svg.addEventListener('pointermove', (e) => {
      if (!last) return;
      const [dx, dy] = [e.clientX - last[0], e.clientY - last[1]];
      last = [e.clientX, e.clientY];
      this.#turnBy(dx * DRAG_RATE, dy * DRAG_RATE, false);
    });
    const end = () => { if (last) { last = null; this.#announce(); } };
    svg.addEventListener('pointerup', end);
    svg.addEventListener('pointercancel', end);
  }

  #turnBy(turn: number, tilt: number, announce: boolean): void {
    this.#sight = { turn: normalTurn(this.#sight.turn + turn), tilt: round1(clampTilt(this.#sight.tilt + tilt)) };
    this.#schedule();
    if (announce) this.#announce();
  }

  #reset(): void {
    if (!this.#payload) return;
    this.#sight = { ...this.#payload.sight };
    this.#schedule();
    this.#announce();
  }

  #key(e: KeyboardEvent): void {
    if (e.altKey || e.ctrlKey || e.metaKey) return;
    const steps: Readonly<Record<string, [number, number]>> = { ArrowLeft: [-KEY_STEP, 0], ArrowRight: [KEY_STEP, 0], ArrowUp: [0, -KEY_STEP], ArrowDown: [0, KEY_STEP] };
    const step = steps[e.key];
    if (step) this.#turnBy(step[0], step[1], true);
    else if (e.key === '0' || e.key === 'Home') this.#reset();
    else return;
    e.preventDefault();
  }

  #toggle(button: HTMLButtonElement): void {
    const layer = button.dataset.toggleLayer ?? '';
    const shown = button.getAttribute('aria-pressed') !== 'true';
    button.setAttribute('aria-pressed', String(shown));
    if (shown) this.#hidden.delete(layer);
    else this.#hidden.add(layer);
    this.#draw();
  }

  /** Redraws at most once a frame. */
  #schedule(): void {
    if (this.#frame) return;
    this.#frame = requestAnimationFrame(() => { this.#frame = 0; this.#draw(); });
  }

  #draw(): void {
    const payload = this.#payload, svg = this.#svg;
    if (!payload || !svg) return;
    const scene = svg.querySelector('g.scene'), gizmo = svg.querySelector('g.gizmo');
    if (scene) scene.innerHTML = spaceSceneMarkup(payload, this.#sight, this.#hidden);
    if (gizmo) gizmo.innerHTML = sightGizmoMarkup(payload, this.#sight);
    svg.dataset.sight = `${this.#sight.turn} ${this.#sight.tilt}`;
    this.toggleAttribute('data-turned', this.#sight.turn !== payload.sight.turn || this.#sight.tilt !== payload.sight.tilt);
    this.#relink();
  }

  /** Says the current sight in the live region (after a key, a button or the end of a drag, not while dragging). */
  #announce(): void {
    const status = this.querySelector('.sight-now');
    if (status) status.textContent = `Turned ${((this.#sight.turn % 360) + 360) % 360}°, tilted ${this.#sight.tilt}°.`;
  }
}

if (!customElements.get('space-figure')) customElements.define('space-figure', SpaceFigureElement);

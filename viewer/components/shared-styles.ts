import { css } from 'lit';

/** Colours and type shared by the workbench components (our own palette: soil, leaf and water). */
export const shared = css`
  :host {
    --ink: #23261f;
    --muted: #5e6257;
    --paper: #fbf9f3;
    --panel: #ffffff;
    --line: #d9d4c4;
    --leaf: #3f6b35;
    --leaf-soft: #e5eedd;
    --water: #2f7fb5;
    --warn: #8a5a00;
    --warn-soft: #fff3d6;
    --bad: #a4281c;
    --bad-soft: #fde8e4;
    color: var(--ink);
    font: 14px/1.4 system-ui, 'Segoe UI', Roboto, sans-serif;
  }
  button {
    font: inherit;
    border: 1px solid var(--leaf);
    background: var(--panel);
    color: var(--leaf);
    border-radius: 6px;
    padding: 0.3rem 0.7rem;
    cursor: pointer;
  }
  button:hover { background: var(--leaf-soft); }
  button:focus-visible, input:focus-visible, select:focus-visible { outline: 3px solid #e0a030; outline-offset: 1px; }
  button[disabled] { opacity: 0.5; cursor: progress; }
  h2 { font-size: 1rem; margin: 0 0 0.4rem; }
`;

/** The frame, grid and lettering both plots (push and flow) draw in. */
export const plotFrame = css`
  :host { display: block; }
  svg { width: 100%; height: auto; background: var(--panel); border: 1px solid var(--line); border-radius: 8px; }
  .axis { stroke: #888; stroke-width: 1; }
  .grid { stroke: #eee; stroke-width: 1; }
  text { font: 11px system-ui, sans-serif; fill: #444; }
`;

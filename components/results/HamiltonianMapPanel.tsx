'use client';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { ElementBreakdown as Breakdown, HamiltonianMapView } from '../../solver/run/hamiltonianMap';
import type { ResultsWorker } from './useResultsWorker';
import { ElementBreakdown } from './ElementBreakdown';
import { colourOf, cssColour, levelLabel, logRange, rampColour, ZERO_COLOUR, type LogRange } from './mapPalette';

/** Space left of and above the matrix for the level labels, in canvas pixels. */
const MARGIN_PX = 34;
const PLOT_PX = 600;

interface Layout {
  scale: number;
  plotPx: number;
}

function layoutOf(size: number): Layout {
  const plotPx = size <= PLOT_PX ? size * Math.max(1, Math.floor(PLOT_PX / size)) : PLOT_PX;
  return { scale: plotPx / size, plotPx };
}

function draw(canvas: HTMLCanvasElement, view: HamiltonianMapView, range: LogRange, layout: Layout, selected: { row: number; column: number } | null) {
  const n = view.size;
  const ctx = canvas.getContext('2d');
  if (!ctx) return;
  // One pixel per element, then scaled without smoothing so each element stays a crisp square.
  const bitmap = document.createElement('canvas');
  bitmap.width = n;
  bitmap.height = n;
  const bctx = bitmap.getContext('2d');
  if (!bctx) return;
  const image = bctx.createImageData(n, n);
  for (let i = 0; i < n * n; i++) {
    const [r, g, b] = colourOf(view.matrix[i], range);
    image.data[4 * i] = r;
    image.data[4 * i + 1] = g;
    image.data[4 * i + 2] = b;
    image.data[4 * i + 3] = 255;
  }
  bctx.putImageData(image, 0, 0);
  ctx.clearRect(0, 0, canvas.width, canvas.height);
  ctx.imageSmoothingEnabled = false;
  ctx.drawImage(bitmap, MARGIN_PX, MARGIN_PX, layout.plotPx, layout.plotPx);

  // Block lines between excitation levels, and their labels on both axes.
  ctx.strokeStyle = '#b7791f';
  ctx.lineWidth = 1;
  ctx.fillStyle = '#1c2333';
  ctx.font = '11px Inter, system-ui, sans-serif';
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  for (const block of view.blocks) {
    const start = MARGIN_PX + block.start * layout.scale;
    const span = block.count * layout.scale;
    if (block.start > 0) {
      ctx.beginPath();
      ctx.moveTo(MARGIN_PX, start + 0.5);
      ctx.lineTo(MARGIN_PX + layout.plotPx, start + 0.5);
      ctx.moveTo(start + 0.5, MARGIN_PX);
      ctx.lineTo(start + 0.5, MARGIN_PX + layout.plotPx);
      ctx.stroke();
    }
    if (span >= 12) {
      ctx.fillText(levelLabel(block.level), start + span / 2, MARGIN_PX / 2);
      ctx.fillText(levelLabel(block.level), MARGIN_PX / 2, start + span / 2);
    }
  }
  ctx.strokeStyle = '#1c2333';
  ctx.strokeRect(MARGIN_PX - 0.5, MARGIN_PX - 0.5, layout.plotPx + 1, layout.plotPx + 1);
  if (selected) {
    ctx.strokeStyle = '#e53e3e';
    ctx.lineWidth = 2;
    const s = Math.max(layout.scale, 4);
    ctx.strokeRect(MARGIN_PX + selected.column * layout.scale - 1, MARGIN_PX + selected.row * layout.scale - 1, s + 2, s + 2);
  }
}

function Legend({ range }: { range: LogRange }) {
  const stops = Array.from({ length: 9 }, (_, k) => cssColour(rampColour(k / 8))).join(', ');
  return (
    <div className="grid gap-1 text-xs text-ink-soft" data-testid="map-legend">
      <div className="flex items-center gap-2">
        <span className="font-mono">10^{range.bottom}</span>
        <span className="h-3 w-48 rounded-sm border border-ink-soft/20" style={{ background: `linear-gradient(to right, ${stops})` }} />
        <span className="font-mono">10^{range.top}</span>
        <span>|⟨D_I|H|D_J⟩| (smaller values sit at the left end)</span>
      </div>
      <div className="flex items-center gap-2">
        <span className="h-3 w-3 rounded-sm border border-ink-soft/20" style={{ background: cssColour(ZERO_COLOUR) }} />
        <span>exactly 0 — by the Slater–Condon rules when more than two spin orbitals differ, or by symmetry</span>
      </div>
      <p>
        Determinants are ordered by excitation level from the reference (ref, 1×, 2×, …; amber lines between levels). For RHF orbitals the
        ref–1× block vanishes to SCF convergence (Brillouin&apos;s theorem). Click an element to take it apart.
      </p>
    </div>
  );
}

/** The Hamiltonian map: drawn on request in the results view's worker, clicked for a breakdown. */
export function HamiltonianMapPanel({ runFile, worker }: { runFile: unknown; worker: ResultsWorker }) {
  const canvasRef = useRef<HTMLCanvasElement | null>(null);
  const [state, setState] = useState<'idle' | 'building' | 'ready' | 'failed'>('idle');
  const [view, setView] = useState<HamiltonianMapView | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [selected, setSelected] = useState<{ row: number; column: number } | null>(null);
  const [breakdown, setBreakdown] = useState<Breakdown | null>(null);
  const [hover, setHover] = useState<{ row: number; column: number } | null>(null);
  const [rowText, setRowText] = useState('1');
  const [columnText, setColumnText] = useState('1');

  const range = useMemo(() => (view ? logRange(view.matrix) : null), [view]);
  const layout = view ? layoutOf(view.size) : null;

  useEffect(() => {
    if (view && canvasRef.current) draw(canvasRef.current, view, logRange(view.matrix), layoutOf(view.size), selected);
  }, [view, selected]);

  const build = async () => {
    setState('building');
    setMessage(null);
    setBreakdown(null);
    setSelected(null);
    const outcome = await worker.hamiltonianMap(runFile);
    if (outcome.ok) {
      setView(outcome.value);
      setState('ready');
    } else {
      setView(null);
      setMessage(outcome.error.message);
      setState('failed');
    }
  };

  const inspect = useCallback(
    async (row: number, column: number) => {
      setSelected({ row, column });
      setRowText(String(row + 1));
      setColumnText(String(column + 1));
      const outcome = await worker.hamiltonianElement(row, column);
      if (outcome.ok) {
        setBreakdown(outcome.value);
        setMessage(null);
      } else {
        setBreakdown(null);
        setMessage(outcome.error.message);
      }
    },
    [worker],
  );

  const positionOf = (event: React.MouseEvent<HTMLCanvasElement>) => {
    if (!view || !layout || !canvasRef.current) return null;
    const rect = canvasRef.current.getBoundingClientRect();
    const x = ((event.clientX - rect.left) * canvasRef.current.width) / rect.width - MARGIN_PX;
    const y = ((event.clientY - rect.top) * canvasRef.current.height) / rect.height - MARGIN_PX;
    const column = Math.floor(x / layout.scale);
    const row = Math.floor(y / layout.scale);
    if (row < 0 || column < 0 || row >= view.size || column >= view.size) return null;
    return { row, column };
  };

  const inspectTyped = () => {
    if (!view) return;
    const row = Number(rowText) - 1;
    const column = Number(columnText) - 1;
    if (!Number.isInteger(row) || !Number.isInteger(column) || row < 0 || column < 0 || row >= view.size || column >= view.size) {
      setMessage(`row and column must be whole numbers from 1 to ${view.size}`);
      return;
    }
    void inspect(row, column);
  };

  const canvasPx = layout ? MARGIN_PX + layout.plotPx + 2 : 0;
  const hoverValue = view && hover ? view.matrix[hover.row * view.size + hover.column] : null;

  return (
    <div className="grid gap-3" data-testid="hamiltonian-map" data-state={state}>
      <div className="flex flex-wrap items-center gap-3">
        <button
          type="button"
          onClick={build}
          disabled={state === 'building'}
          className="rounded-md border border-ket-500 px-4 py-2 text-sm font-semibold text-ket-700 hover:bg-ket-50 disabled:opacity-50"
          data-testid="map-draw"
        >
          {state === 'building' ? 'Building the map…' : view ? 'Redraw the Hamiltonian map' : 'Draw the Hamiltonian map'}
        </button>
        <p className="text-xs text-ink-soft">Rebuilds the run&apos;s CI Hamiltonian in a worker (up to 2,500 determinants).</p>
      </div>
      {message ? (
        <p className="rounded-md bg-caution-50 p-2 text-sm text-caution-700" role="alert" data-testid="map-message">
          {message}
        </p>
      ) : null}
      {view && range && layout ? (
        <>
          <p className="text-sm text-ink-soft" data-testid="map-summary">
            {view.size.toLocaleString('en-US')} determinant{view.size === 1 ? '' : 's'} over {view.activeOrbitals} active orbitals, levels{' '}
            {view.blocks.map((b) => `${levelLabel(b.level)} (${b.count})`).join(', ')}.
          </p>
          <div className="overflow-x-auto">
            <canvas
              ref={canvasRef}
              width={canvasPx}
              height={canvasPx}
              style={{ width: canvasPx, height: canvasPx, cursor: 'crosshair' }}
              data-testid="map-canvas"
              data-size={view.size}
              data-margin={MARGIN_PX}
              data-scale={layout.scale}
              aria-label={`Hamiltonian map, ${view.size} by ${view.size}`}
              onClick={(e) => {
                const p = positionOf(e);
                if (p) void inspect(p.row, p.column);
              }}
              onMouseMove={(e) => setHover(positionOf(e))}
              onMouseLeave={() => setHover(null)}
            />
          </div>
          <p className="h-5 font-mono text-xs text-ink-soft" data-testid="map-hover">
            {hover && hoverValue !== null
              ? `row ${hover.row + 1} (α ${view.alpha[hover.row]} β ${view.beta[hover.row]}), column ${hover.column + 1} (α ${view.alpha[hover.column]} β ${view.beta[hover.column]}): ${hoverValue.toExponential(6)}`
              : ''}
          </p>
          <Legend range={range} />
          <div className="flex flex-wrap items-end gap-2 text-sm">
            <label className="grid gap-0.5">
              <span className="text-xs text-ink-soft">row</span>
              <input value={rowText} onChange={(e) => setRowText(e.target.value)} inputMode="numeric" className="w-20 rounded-md border border-ink-soft/30 px-2 py-1" data-testid="map-row" />
            </label>
            <label className="grid gap-0.5">
              <span className="text-xs text-ink-soft">column</span>
              <input value={columnText} onChange={(e) => setColumnText(e.target.value)} inputMode="numeric" className="w-20 rounded-md border border-ink-soft/30 px-2 py-1" data-testid="map-column" />
            </label>
            <button type="button" onClick={inspectTyped} className="rounded-md border border-ket-500 px-3 py-1 text-sm font-semibold text-ket-700 hover:bg-ket-50" data-testid="map-inspect">
              Take the element apart
            </button>
          </div>
          {selected ? (
            <p className="font-mono text-xs" data-testid="map-selected" data-value={view.matrix[selected.row * view.size + selected.column]} data-row={selected.row} data-column={selected.column}>
              map element [{selected.row + 1}, {selected.column + 1}] = {view.matrix[selected.row * view.size + selected.column].toFixed(12)}
            </p>
          ) : null}
          {breakdown ? <ElementBreakdown breakdown={breakdown} energyUnit={view.energyUnit} /> : null}
        </>
      ) : null}
    </div>
  );
}

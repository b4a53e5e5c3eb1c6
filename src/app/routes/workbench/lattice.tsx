import { useDeferredValue, useId, useMemo, useState } from 'react';
import { CsvFileInput } from '@/components/ui/csv-file-input.tsx';
import { useUrlSettings } from '@/features/workbench/form/use-url-settings.ts';
import { parseOptionalNumber } from '@/lib/csv/number-text.ts';
import { formatSig } from '@shared/format/measured-number.ts';
import { inputClass, InputField, SelectField } from '@/components/ui/form-bits.tsx';
import { NoResult, ResultNotesBlock } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { pngToHeights } from '@/features/workbench/lattice/decode-png.ts';
import { exampleLatticeRows } from '@/features/workbench/lattice/example-image.ts';
import { CorrectedImageCanvas, HeightImage, SpectrumImage } from '@/features/workbench/lattice/lattice-canvases.tsx';
import { useDecodeImage } from '@/features/workbench/lattice/use-decode-image.ts';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import type { RunRecordData } from '@shared/schemas/run.ts';
import { RecordRunPanel } from './record-run-panel.tsx';
import { LatticeResults } from '@/features/workbench/lattice/lattice-results.tsx';
import { parseMatrix } from '@/features/workbench/lattice/parse-matrix.ts';
import { useLatticeWorker } from '@/features/workbench/lattice/use-lattice-worker.ts';
import { ToolInputs } from './tool-inputs.tsx';

const KINDS = ['hexagonal', 'square', 'line'] as const;
type Kind = (typeof KINDS)[number];
const LATTICE_KINDS: readonly { value: Kind; label: string }[] = [
  { value: 'hexagonal', label: 'Hexagonal (6 peaks)' },
  { value: 'square', label: 'Square (4 peaks)' },
  { value: 'line', label: 'Line grating (2 peaks)' },
];
/** The lattice and the drive spans live in the link; the image does not. */
const SETTINGS = {
  kind: { param: 'kind', fallback: 'hexagonal', allowed: KINDS },
  constant: { param: 'a', fallback: '0.246' },
  spanX: { param: 'vx', fallback: '' },
  spanY: { param: 'vy', fallback: '' },
};
/** Presets: graphite's lattice constant [S: Trucano & Chen, Nature 258, 136 (1975)]; else the user's figure. */
const PRESETS = [
  { value: 'hopg', label: 'Graphite (HOPG), a = 0.246 nm', kind: 'hexagonal' as Kind, constant: '0.246' },
  { value: 'custom', label: 'Other: my lattice or grating pitch', kind: null, constant: null },
] as const;
const LARGE_TEXT = 200_000;

const positive = (s: string): number | undefined => {
  const v = parseOptionalNumber(s);
  return v !== undefined && Number.isFinite(v) && v > 0 ? v : undefined;
};

export function LatticePage() {
  const textId = useId();
  const pngId = useId();
  const [settings, set] = useUrlSettings(SETTINGS);
  const kind = settings.kind as Kind;
  const { constant, spanX, spanY } = settings;
  const preset = kind === 'hexagonal' && constant.trim() === '0.246' ? 'hopg' : 'custom';

  // The image: the example, typed text, a loaded text file or a PNG.
  const [text, setText] = useState('');
  const [loaded, setLoaded] = useState<{ rows: Float64Array[] | number[][]; note: string } | null>({
    rows: exampleLatticeRows(),
    note: 'Showing an invented example (hexagonal, 0.02 nm/px, turned 8°); paste or load your own image.',
  });
  const [loadError, setLoadError] = useState<string | null>(null);
  const deferredText = useDeferredValue(text);
  const typed = useMemo(() => (deferredText.trim() ? parseMatrix(deferredText) : null), [deferredText]);
  const rows = typed?.ok ? typed.rows : (loaded?.rows ?? null);
  const inputProblem = typed && !typed.ok ? typed.message : loadError;

  const onTextFile = (t: string) => {
    setLoadError(null);
    if (t.length > LARGE_TEXT) {
      const parsed = parseMatrix(t);
      setText('');
      if (parsed.ok)
        setLoaded({
          rows: parsed.rows,
          note: `Loaded a ${parsed.rows[0]?.length ?? 0} × ${parsed.rows.length} matrix (too long to show as text).`,
        });
      else setLoadError(parsed.message);
    } else setText(t);
  };
  const decode = useDecodeImage();
  const onImage = async (file: File | undefined) => {
    if (!file) return;
    setLoadError(null);
    const isPng = /\.png$/i.test(file.name) || file.type === 'image/png';
    try {
      if (isPng) {
        // PNGs are read here; TIFFs go to the server, whose decoder (sharp) reads them.
        const png = pngToHeights(await file.arrayBuffer());
        setText('');
        setLoaded({ rows: png.rows, note: `Loaded ${file.name}: ${png.width} × ${png.height} px, ${png.bitDepth}-bit.` });
      } else {
        const img = await decode.mutateAsync(file);
        setText('');
        setLoaded({
          rows: img.heights,
          note: `Loaded ${file.name}: ${img.width} × ${img.height} px, ${img.bitDepth === 32 ? '32-bit float' : `${img.bitDepth}-bit`} ${img.format.toUpperCase()}.`,
        });
      }
    } catch (err) {
      setLoadError(isPng ? `${file.name} could not be read as a PNG.` : `${file.name}: ${errorMessage(err)}`);
    }
  };

  const a = positive(constant);
  const vx = positive(spanX);
  const vy = positive(spanY);
  const request = useMemo(() => {
    if (!rows || rows.length === 0 || a === undefined) return null;
    const asArrays = rows.map((r) => (r instanceof Float64Array ? r : Float64Array.from(r)));
    return { rows: asArrays, lattice: { kind, constantNm: a }, ...(vx && vy ? { scanSpanV: { x: vx, y: vy } } : {}) };
  }, [rows, kind, a, vx, vy]);
  const state = useLatticeWorker(request);
  const result = state.status === 'done' && state.reply.ok ? state.reply.result : null;
  // A run needs a two-dimensional lattice, both spans and the ± (the lattice found in at least three quarters).
  const runData: RunRecordData | null = useMemo(() => {
    if (!result || kind === 'line' || !vx || !vy || !result.standardUncertainty || result.peaks.length !== 2 || a === undefined)
      return null;
    return {
      kind: 'lattice',
      lattice: { kind, constantNm: a },
      image: { width: result.width, height: result.height },
      scanSpanV: { x: vx, y: vy },
      peaks: result.peaks.map(({ kx, ky }) => ({ kx, ky })),
      quadrantPeaks: result.quadrantPeaks.map((q) => q.map(({ kx, ky }) => ({ kx, ky }))),
    };
  }, [result, kind, vx, vy, a]);

  return (
    <ToolPage
      slug="lattice"
      linkNote="the image itself is not kept in the link, only the lattice and the drive spans"
      lead="Read your scanner's pixel size, axis skew and gains off an image of a lattice whose spacing you know — graphite's atoms or a calibration grating. Everything runs in your browser."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <section aria-label="Height image" className="space-y-3 rounded-lg border border-rule bg-white p-4">
              <div>
                <label htmlFor={textId} className="block text-sm font-medium">
                  Heights (one row of numbers per line; commas, tabs or spaces)
                </label>
                <textarea
                  id={textId}
                  rows={6}
                  spellCheck={false}
                  aria-describedby={`${textId}-hint`}
                  className={`num mt-1 text-sm ${inputClass}`}
                  value={text}
                  placeholder="0.12, 0.15, 0.11, …"
                  onChange={(e) => setText(e.target.value)}
                />
                <p id={`${textId}-hint`} className="mt-1 text-xs text-ink-soft">
                  From 16 × 16 up to 1024 × 1024. {!typed && loaded ? loaded.note : null}
                </p>
              </div>
              <CsvFileInput maxBytes={32 * 1024 * 1024} tooLarge="crop the image to 1024 × 1024 first." onText={onTextFile} />
              <div>
                <label htmlFor={pngId} className="block text-sm font-medium">
                  Or load a greyscale PNG or TIFF (8 or 16 bits, or 32-bit float TIFF)
                </label>
                <input
                  id={pngId}
                  type="file"
                  accept=".png,.tif,.tiff,image/png,image/tiff"
                  className="mt-1 block w-full text-sm file:mr-3 file:rounded-md file:border file:border-teal file:bg-white file:px-3 file:py-1 file:text-teal-dark"
                  onChange={(e) => void onImage(e.target.files?.[0])}
                />
                {decode.isPending && (
                  <p role="status" className="mt-1 text-xs text-ink-soft">
                    Reading the TIFF…
                  </p>
                )}
              </div>
              {inputProblem && (
                <p role="alert" className="text-sm text-red-700">
                  {inputProblem}
                </p>
              )}
            </section>
            <section aria-label="Lattice and drive" className="grid gap-3 rounded-lg border border-rule bg-white p-4 sm:grid-cols-2">
              <SelectField
                id="lat-preset"
                label="Reference"
                value={preset}
                options={PRESETS}
                onChange={(e) => {
                  const p = PRESETS.find((x) => x.value === e.target.value);
                  if (p?.kind) set('kind', p.kind);
                  if (p?.constant) set('constant', p.constant);
                  else if (p) set('constant', '');
                }}
              />
              <SelectField
                id="lat-kind"
                label="Lattice"
                value={kind}
                options={LATTICE_KINDS}
                onChange={(e) => set('kind', e.target.value as Kind)}
              />
              <InputField
                id="lat-a"
                label={kind === 'line' ? 'Grating pitch (nm)' : 'Lattice constant (nm)'}
                hint="Graphite 0.246 nm (Trucano & Chen 1975): the spacing of the atoms an STM shows, not the 0.142 nm bond."
                inputMode="decimal"
                value={constant}
                onChange={(e) => set('constant', e.target.value)}
              />
              <div className="grid grid-cols-2 gap-3 sm:col-span-2">
                <InputField
                  id="lat-vx"
                  label="Drive span x (V)"
                  hint="Over the full width; optional."
                  inputMode="decimal"
                  value={spanX}
                  onChange={(e) => set('spanX', e.target.value)}
                />
                <InputField
                  id="lat-vy"
                  label="Drive span y (V)"
                  hint="Over the full height; optional."
                  inputMode="decimal"
                  value={spanY}
                  onChange={(e) => set('spanY', e.target.value)}
                />
              </div>
            </section>
            {rows && rows.length > 0 && (
              <section aria-label="The image" className="rounded-lg border border-rule bg-white p-4">
                <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">Image</h2>
                <HeightImage rows={rows} label={`Height image, ${rows[0]?.length ?? 0} × ${rows.length} pixels, grey scale`} />
              </section>
            )}
          </ToolInputs>
        }
        results={
          a === undefined ? (
            <NoResult message="Enter the lattice constant or grating pitch in nm." />
          ) : state.status === 'done' && state.reply.ok ? (
            <>
              <ResultNotesBlock r={state.reply.result} />
              <LatticeResults r={state.reply.result} ms={state.reply.ms} />
              <section aria-label="Spectrum" className="rounded-lg border border-rule bg-white p-4">
                <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">Spectrum (log scale)</h2>
                <SpectrumImage
                  spectrum={state.reply.spectrum}
                  size={state.reply.paddedSize}
                  peaks={state.reply.result.peaks}
                  others={state.reply.candidates.slice(0, 8)}
                />
                <p className="mt-2 text-xs text-ink-soft">
                  Thick rings: the peaks used, with their mirror images. Thin rings: other strong peaks.
                </p>
              </section>
              {state.reply.corrected && (
                <section aria-label="Corrected image" className="rounded-lg border border-rule bg-white p-4">
                  <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
                    Corrected image, ideal lattice over it
                  </h2>
                  <CorrectedImageCanvas
                    image={state.reply.corrected}
                    sites={state.reply.sites}
                    label={`The image redrawn on square ${formatSig(state.reply.corrected.nmPerPixel, 3)} nm pixels, with ${state.reply.sites.length} sites of the ideal ${kind} lattice as dots`}
                  />
                  <p className="mt-2 text-xs text-ink-soft">
                    Redrawn through the solved pixel-to-nm map on square {formatSig(state.reply.corrected.nmPerPixel, 3)} nm pixels
                    (bilinear). Teal dots: the ideal lattice through the brightest point near the centre. Where the dots drift off the
                    bright points towards an edge, the scan crept or drifted there.
                  </p>
                </section>
              )}
              {kind === 'line' ? null : runData ? (
                <RecordRunPanel data={runData} defaultMethod="reference-sample" />
              ) : (
                <p className="rounded-lg border border-dashed border-rule bg-white p-4 text-sm">
                  To record this as a calibration run of an X, Y or XY actuator, enter both drive spans
                  {result?.standardUncertainty ? '' : ' (and load an image in which the lattice shows in at least three quarters)'}.
                </p>
              )}
            </>
          ) : state.status === 'done' && !state.reply.ok ? (
            <NoResult message={state.reply.message} />
          ) : (
            <p role="status" className="text-sm text-ink-soft">
              {state.status === 'running' ? 'Analysing the image…' : 'Paste or load an image.'}
            </p>
          )
        }
      />
    </ToolPage>
  );
}

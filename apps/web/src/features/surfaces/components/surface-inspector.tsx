import type { Surface } from '../types';
import { metresText } from '../utils/density-units';
import { CAUTION_LINE, kernelOptions, ruleOptions } from '../utils/surface-explanations';
import { SurfaceStatusBadge } from './surface-status-badge';
import { SurfaceThresholds } from './surface-thresholds';

/**
 * The inspector beside the map for the surface on show: what was used (bandwidth and why, cell size,
 * grid, projection, method, credits) and its percent-volume contours, with the caution line.
 * @param props the surface
 * @returns the inspector body
 * @example <SurfaceInspector surface={surface} />
 */
export function SurfaceInspector({ surface: s }: { surface: Surface }) {
  const kernel = kernelOptions.find((k) => k.value === s.params.kernel)?.label.replace(' (suggested)', '') ?? s.params.kernel;
  const rule = s.params.bandwidth.mode === 'rule' ? ruleOptions.find((r) => r.value === (s.params.bandwidth as { rule: string }).rule)?.label : 'set by hand';
  const r = s.resolved;
  const rows: [string, string][] = [
    ['Kernel', kernel],
    ['Bandwidth', r ? `${metresText(r.bandwidth.value)} (${rule ?? r.bandwidth.rule})` : (rule ?? '')],
    ...(r
      ? ([
          ['Kernel radius · Gaussian sd', `${metresText(r.bandwidth.radius)} · ${metresText(r.bandwidth.gaussianSd)}`],
          ['Cell size', metresText(r.cellSize.value)],
          ['Grid', `${r.grid.width.toLocaleString('en')} × ${r.grid.height.toLocaleString('en')} cells`],
          ['Projection', r.projection.label],
          ['Method', r.method === 'binned' ? 'binned (FFT)' : 'exact sum'],
        ] as [string, string][])
      : []),
    ['Study area', s.params.studyArea.type === 'polygon' ? 'uploaded polygon' : 'customers’ extent'],
    ['Edge correction · adaptive', `${s.params.edgeCorrection ? 'on' : 'off'} · ${s.params.adaptive ? 'on' : 'off'}`],
    ['Customers · credits', `${s.pointCount.toLocaleString('en')} · ${s.costCredits.toLocaleString('en')}`],
  ];
  return (
    <div className="flex flex-col gap-3 p-4 text-sm" aria-label="Inspector">
      <div className="flex items-start justify-between gap-2">
        <h3 className="min-w-0 font-semibold break-words text-ink">{s.name}</h3>
        <SurfaceStatusBadge status={s.status} />
      </div>
      <dl className="grid grid-cols-1 gap-1.5 text-xs">
        {rows.map(([label, value]) => (
          <div key={label}>
            <dt className="text-ink-muted">{label}</dt>
            <dd className="text-ink tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
      {r?.bandwidth.explanation ? <p className="text-xs text-ink-muted">{r.bandwidth.explanation}</p> : null}
      {s.thresholds?.length ? <SurfaceThresholds thresholds={s.thresholds} unit={s.params.unit} /> : null}
      <p className="text-xs text-ink-faint">{CAUTION_LINE}</p>
    </div>
  );
}

import type { SurfaceFormValues } from '../api/create-surface';
import type { StudyArea, SurfaceCreateBody } from '../types';

/**
 * The API body for estimate and create from the form's values.
 * @param values the form's values (already valid)
 * @param polygon the uploaded study-area geometry, when the study area is a polygon
 * @returns the body, or null while it cannot be sent (no file; polygon chosen but not uploaded; bad numbers)
 * @example surfaceBodyFrom(values, null)
 */
export function surfaceBodyFrom(
  values: SurfaceFormValues,
  polygon: Extract<StudyArea, { type: 'polygon' }>['geometry'] | null,
): SurfaceCreateBody | null {
  if (!values.customerFileId) return null;
  let bandwidth: SurfaceCreateBody['bandwidth'];
  if (values.bandwidthMode === 'value') {
    const h = Number(values.bandwidthValue);
    if (!values.bandwidthValue || !(h > 0) || h > 200_000) return null;
    bandwidth = { mode: 'value', value: h };
  } else bandwidth = { mode: 'rule', rule: values.rule };
  const cell = values.cellSize ? Number(values.cellSize) : undefined;
  if (cell !== undefined && !(cell >= 1 && cell <= 100_000)) return null;
  if (values.studyAreaType === 'polygon' && !polygon) return null;
  return {
    customerFileId: values.customerFileId,
    ...(values.name.trim() ? { name: values.name.trim() } : {}),
    kernel: values.kernel,
    bandwidth,
    ...(cell !== undefined ? { cellSize: cell } : {}),
    studyArea: values.studyAreaType === 'polygon' && polygon ? { type: 'polygon', geometry: polygon } : { type: 'extent' },
    edgeCorrection: values.edgeCorrection,
    adaptive: values.adaptive,
    unit: values.unit,
    method: values.method,
  };
}

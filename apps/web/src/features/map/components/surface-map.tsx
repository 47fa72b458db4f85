import { Alert, Spinner } from '@demandscape/ui';
import { useMemo, useState } from 'react';
import { env } from '../../../config/env';
import { errorMessage } from '../../../lib/api-error';
import { roleCan } from '../../../lib/authorization';
import type { Role } from '../../../types/api';
import { useDemoBasemap } from '../api/get-basemap';
import { useCustomerAggregate } from '../api/get-customer-aggregate';
import { useSurfaceContours } from '../api/get-surface-contours';
import { useSurfaceDifferenceRaster } from '../api/get-surface-difference-raster';
import { useSurfaceWebRaster } from '../api/get-surface-web-raster';
import { useRasterImage } from '../hooks/use-raster-image';
import { useSyncedCameras } from '../hooks/use-synced-cameras';
import { demoBasemapStyle } from '../lib/basemap-style';
import type { SitesOnMap } from '../hooks/use-sites-on-map';
import type { MapCustomerFile, MapScope, MapSurface, MapWeight } from '../types';
import { densityUnitLabel } from '../utils/density-unit';
import { rasterValueAt } from '../utils/web-raster';
import { CompareControls, type CompareMode } from './compare-controls';
import { CustomerLegend, customerColourStops } from './customer-legend';
import { HoverReadout } from './hover-readout';
import { DEMO_VIEW } from './basemap-site-map';
import { MapCanvas } from './map-canvas';
import { SiteLegend } from './site-legend';
import { SurfaceLegend } from './surface-legend';

/**
 * Sites on the map (all optional): `sites` draws them with a legend; `selectedSiteId` rings one;
 * `onSiteSelect(id)` fires on a click on a site; `onMapClickAdd({ lon, lat })`, when set, turns a
 * click on empty map into a position (crosshair cursor, hint); `onSiteMove(id, { lon, lat })`, when
 * set, makes sites draggable and fires once on release.
 */
export type SurfaceMapSiteProps = SitesOnMap;

type SurfaceMapOwnProps = {
  scope: MapScope;
  /** The surface to show (only a succeeded one has results). Without one, use `BasemapSiteMap`. */
  surface: MapSurface;
  /** The surface's customer file (legend words; the customer bins toggle). */
  customerFile: MapCustomerFile | null;
  /**
   * The legend's weight words when there is no customer file to read them from (an executive's view,
   * which never gets the file); a customer file, when passed, wins. Without either: customers.
   */
  weight?: MapWeight;
  /** The viewer's role: aggregated customers only for owners and analysts. */
  role: Role | undefined;
  /** Other surfaces of the workspace to compare with (succeeded ones are offered). */
  compareCandidates?: MapSurface[];
};

export type SurfaceMapProps = SurfaceMapOwnProps & SurfaceMapSiteProps;

/**
 * A demand surface on the map: the offline demo basemap (or the production style), the coloured
 * surface with opacity, legend in real units, contour switches, the value under the cursor, the
 * aggregated customer view for owners and analysts, a comparison with a second surface, and the
 * study's sites (see `SurfaceMapSiteProps`). Without a surface, `BasemapSiteMap` shows the sites alone.
 * @param props the study scope, the surface, its customer file (or the weight words alone), the viewer's role, surfaces to compare with, sites
 * @returns the map panel
 * @example <SurfaceMap scope={{ orgId, workspaceId }} surface={surface} customerFile={file} role={role} compareCandidates={surfaces} sites={sites} onSiteSelect={select} />
 * @example <SurfaceMap scope={scope} surface={surface} customerFile={null} weight={{ kind: 'other', label: 'annual spend (€)' }} role="executive" />
 */
export function SurfaceMap({ scope, surface, customerFile, weight, role, compareCandidates = [], ...siteProps }: SurfaceMapProps) {
  const styleUrl = env.VITE_BASEMAP_STYLE_URL;
  const basemap = useDemoBasemap(!styleUrl);
  const ready = surface.status === 'succeeded';
  const raster = useSurfaceWebRaster(scope, ready ? surface.id : null);
  const contours = useSurfaceContours(scope, ready ? surface.id : null);
  const [opacity, setOpacity] = useState(0.8);
  const [contourVisible, setContourVisible] = useState<Record<number, boolean>>({ 50: true, 75: true, 90: true });
  const [hover, setHover] = useState<{ lng: number; lat: number } | null>(null);
  const [zoom, setZoom] = useState(Math.round(DEMO_VIEW.zoom));
  const canSeeCustomers = roleCan(role, 'customerPoints:read') && customerFile !== null;
  const [showCustomers, setShowCustomers] = useState(false);
  const bins = useCustomerAggregate(scope, canSeeCustomers && showCustomers && customerFile ? customerFile.id : null, zoom);
  // Only surfaces in the same area unit compare cell by cell.
  const candidates = compareCandidates.filter((s) => s.id !== surface.id && s.status === 'succeeded' && s.params.unit === surface.params.unit);
  const [otherId, setOtherId] = useState<string | null>(null);
  const [mode, setMode] = useState<CompareMode>('difference');
  const other = candidates.find((s) => s.id === otherId) ?? null;
  const difference = useSurfaceDifferenceRaster(scope, surface.id, ready && other && mode === 'difference' ? other.id : null);
  const otherRaster = useSurfaceWebRaster(scope, ready && other && mode === 'side-by-side' ? other.id : null);
  const showDifference = other !== null && mode === 'difference';
  const shown = showDifference ? difference : raster;
  // Side by side, both maps use one colour scale so equal colours mean equal demand.
  const pairTop = otherRaster.data && raster.data ? Math.max(otherRaster.data.max, raster.data.max) : undefined;
  const main = useRasterImage(shown.data, showDifference ? 'diverging' : 'sequential', showDifference ? undefined : pairTop);
  const right = useRasterImage(otherRaster.data, 'sequential', pairTop);
  const cameras = useSyncedCameras();

  const style = useMemo(() => (styleUrl ? styleUrl : basemap.data ? demoBasemapStyle(basemap.data) : null), [styleUrl, basemap.data]);
  const customerColours = useMemo(() => customerColourStops(Math.max(0, ...(bins.data?.features.map((f) => f.properties.count) ?? [0]))), [bins.data]);
  const weightKind = customerFile ? customerFile.weightKind : (weight?.kind ?? 'count');
  const weightLabel = customerFile ? customerFile.weightLabel : weight?.label;
  const unitText = densityUnitLabel(weightKind, surface.params.unit, weightLabel);

  if (!ready) {
    return (
      <Alert tone="info" title={`“${surface.name}” is ${surface.status}`}>
        The map shows a surface once its run has succeeded.
      </Alert>
    );
  }
  const loadError = basemap.error ?? raster.error ?? shown.error ?? contours.error ?? bins.error ?? otherRaster.error;
  if (!style || (raster.isPending && !raster.error)) return <Spinner label="Loading the map" className="flex h-80 items-center justify-center" />;

  const hoverValue = hover && shown.data ? rasterValueAt(shown.data, hover.lng, hover.lat) : undefined;
  const rightValue = hover && otherRaster.data ? rasterValueAt(otherRaster.data, hover.lng, hover.lat) : undefined;
  const bounds = raster.data?.bounds ?? null;
  const shared = { style, labelsFrom: styleUrl ? null : basemap.data, initialView: DEMO_VIEW, fitBounds: bounds, fitKey: surface.id, onHover: setHover };
  const sideBySide = other !== null && mode === 'side-by-side';

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex flex-col gap-1 text-xs">
          <span className="font-semibold text-ink">
            Surface opacity <span className="font-normal text-ink-muted tabular-nums">{Math.round(opacity * 100)} %</span>
          </span>
          <input type="range" min={0} max={1} step={0.05} value={opacity} onChange={(e) => setOpacity(Number(e.target.value))} className="w-36 accent-accent" />
        </label>
        {canSeeCustomers ? (
          <label className="flex items-center gap-2 text-xs text-ink">
            <input type="checkbox" checked={showCustomers} onChange={(e) => setShowCustomers(e.target.checked)} className="accent-accent" />
            Show customers (counted in squares)
          </label>
        ) : null}
        <CompareControls candidates={candidates} otherId={otherId} mode={mode} onOther={setOtherId} onMode={setMode} />
      </div>
      {loadError ? <Alert tone="danger" title="Part of the map did not load">{errorMessage(loadError)}</Alert> : null}
      {main.error ? <Alert tone="caution">{main.error}</Alert> : null}
      <div className={sideBySide ? 'grid h-[28rem] grid-cols-2 gap-2' : 'h-[28rem]'}>
        <div className="relative h-full">
          <MapCanvas
            key={`${surface.id}-${typeof style === 'string' ? style : 'demo'}-${sideBySide ? 'pair' : 'single'}`}
            {...shared}
            label={showDifference ? `Difference between ${other?.name} and ${surface.name}` : `Demand surface ${surface.name}`}
            surfaceImage={main.image}
            surfaceOpacity={opacity}
            contours={showDifference ? null : (contours.data ?? null)}
            contourVisible={contourVisible}
            customerBins={showCustomers && canSeeCustomers ? (bins.data ?? null) : null}
            customerColours={customerColours}
            onZoom={setZoom}
            onMapReady={sideBySide ? cameras.leftReady : undefined}
            {...siteProps}
          />
          <div className="pointer-events-none absolute top-2 right-2 max-w-[70%]">
            <HoverReadout value={hoverValue} unitText={unitText} signed={showDifference} />
          </div>
        </div>
        {sideBySide && other ? (
          <div className="relative h-full">
            <MapCanvas
              key={`${other.id}-pair`}
              {...shared}
              label={`Demand surface ${other.name}`}
              surfaceImage={right.image}
              surfaceOpacity={opacity}
              onMapReady={cameras.rightReady}
              sites={siteProps.sites}
              selectedSiteId={siteProps.selectedSiteId}
            />
            <div className="pointer-events-none absolute top-2 right-2 max-w-[70%]">
              <HoverReadout value={rightValue} unitText={densityUnitLabel(weightKind, other.params.unit, weightLabel)} />
            </div>
            <p className="absolute bottom-2 left-2 rounded-control bg-surface/90 px-2 py-1 text-xs text-ink">{other.name}</p>
          </div>
        ) : null}
      </div>
      <div className="grid gap-4 md:grid-cols-2">
        <SurfaceLegend
          unit={surface.params.unit}
          weightKind={weightKind}
          weightLabel={weightLabel}
          scaleTop={main.scaleTop}
          mode={showDifference ? 'difference' : 'surface'}
          compareName={other?.name}
          thresholds={surface.thresholds}
          contourVisible={contourVisible}
          onContourToggle={(percent, visible) => setContourVisible((v) => ({ ...v, [percent]: visible }))}
        />
        {siteProps.sites ? <SiteLegend sites={siteProps.sites} /> : null}
        {showCustomers && canSeeCustomers && bins.data ? (
          <CustomerLegend
            maxCount={customerColours[customerColours.length - 1][0]}
            binSizeM={bins.data.binSizeM}
            minCount={bins.data.minCount}
            suppressedCustomers={bins.data.suppressed?.customers}
          />
        ) : null}
      </div>
    </div>
  );
}

import { Alert, Spinner } from '@demandscape/ui';
import { useMemo } from 'react';
import { env } from '../../../config/env';
import { errorMessage } from '../../../lib/api-error';
import { useDemoBasemap } from '../api/get-basemap';
import type { SitesOnMap } from '../hooks/use-sites-on-map';
import { demoBasemapStyle } from '../lib/basemap-style';
import { siteBounds } from '../utils/site-geojson';
import { MapCanvas } from './map-canvas';
import { SiteLegend } from './site-legend';

/** Quillport (the demo city, open sea) when there is nothing to fit yet. */
export const DEMO_VIEW = { center: [-38.5, 44.5] as [number, number], zoom: 10.5 };

export type BasemapSiteMapProps = SitesOnMap & {
  /** A line above the map, e.g. why there is no surface yet. */
  note?: string;
};

/**
 * The basemap with the study's sites and no demand surface (before one has been built): same symbols,
 * legend, selection, dragging and add-on-click as over a surface. Fits the sites once.
 * @param props sites, the selected one, handlers and an optional note
 * @returns the map panel
 * @example <BasemapSiteMap sites={sites} onSiteSelect={select} onMapClickAdd={adding ? place : undefined} />
 */
export function BasemapSiteMap({ note, ...sites }: BasemapSiteMapProps) {
  const styleUrl = env.VITE_BASEMAP_STYLE_URL;
  const basemap = useDemoBasemap(!styleUrl);
  const style = useMemo(() => (styleUrl ? styleUrl : basemap.data ? demoBasemapStyle(basemap.data) : null), [styleUrl, basemap.data]);
  const bounds = useMemo(() => siteBounds(sites.sites ?? []), [sites.sites]);
  if (basemap.error) return <Alert tone="danger" title="The map did not load">{errorMessage(basemap.error)}</Alert>;
  if (!style) return <Spinner label="Loading the map" className="flex h-80 items-center justify-center" />;
  return (
    <div className="flex flex-col gap-3">
      {note ? <p className="text-xs text-ink-muted">{note}</p> : null}
      <div className="h-[28rem]">
        <MapCanvas
          key={typeof style === 'string' ? style : 'demo'}
          style={style}
          labelsFrom={styleUrl ? null : basemap.data}
          initialView={DEMO_VIEW}
          fitBounds={bounds}
          // Fit when the first site arrives, not on every edit or move.
          fitKey={bounds ? 'sites' : null}
          label="Map of the study’s sites"
          {...sites}
        />
      </div>
      <SiteLegend sites={sites.sites ?? []} />
    </div>
  );
}

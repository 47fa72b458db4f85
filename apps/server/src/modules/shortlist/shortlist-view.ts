import { SHORTLIST_CAUTION } from './shortlist-caution.js';
import type { Shortlist, ShortlistVersion } from './shortlist.entity.js';
import type {
  ShortlistJson,
  ShortlistSummaryJson,
  ShortlistVersionJson,
} from './shortlist.types.js';

const person = (u: { id: string; name: string } | null) => (u ? { id: u.id, name: u.name } : null);

/**
 * A shortlist without its content (lists).
 * @param s - the shortlist (workspace and createdBy loaded)
 * @returns the summary JSON
 * @example
 * res.json({ shortlists: rows.map(shortlistSummaryJson) });
 */
export function shortlistSummaryJson(s: Shortlist): ShortlistSummaryJson {
  return {
    id: s.id,
    workspaceId: s.workspace.id,
    workspaceName: s.workspace.name,
    name: s.name,
    latestVersion: s.latestVersion,
    itemCount: s.itemCount,
    sharedAt: s.sharedAt?.toISOString() ?? null,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
    createdBy: person(s.createdBy),
  };
}

/**
 * One version as the API sends it.
 * @param v - the version (createdBy loaded)
 * @returns the version JSON
 * @example
 * const json = shortlistVersionJson(version);
 */
export function shortlistVersionJson(v: ShortlistVersion): ShortlistVersionJson {
  return {
    ...v.snapshot,
    version: v.version,
    createdAt: v.createdAt.toISOString(),
    createdBy: person(v.createdBy),
    versionNote: v.versionNote,
  };
}

/**
 * A shortlist with one version's content, the list of all versions, who it was shared with and the caution.
 * @param s - the shortlist (workspace and createdBy loaded)
 * @param versions - all its versions, any order (createdBy loaded)
 * @param shown - the version to include
 * @returns the shortlist JSON
 * @example
 * res.json({ shortlist: shortlistJson(s, versions, versions[versions.length - 1]) });
 */
export function shortlistJson(
  s: Shortlist,
  versions: ShortlistVersion[],
  shown: ShortlistVersion,
): ShortlistJson {
  return {
    ...shortlistSummaryJson(s),
    version: shortlistVersionJson(shown),
    versions: [...versions]
      .sort((a, b) => a.version - b.version)
      .map((v) => ({
        version: v.version,
        createdAt: v.createdAt.toISOString(),
        createdBy: person(v.createdBy),
        versionNote: v.versionNote,
        itemCount: v.itemCount,
      })),
    sharedWith: s.sharedWith,
    caution: SHORTLIST_CAUTION,
  };
}

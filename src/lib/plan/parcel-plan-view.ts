import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { chainageRange } from './linear-referencing';
import { type StoredPlan, loadParcelPlan } from './load-parcel-plan';
import { type PlanDrawing, layOutPlan } from './plan-drawing';
import type { PlanCategory } from './plan-style';
import { boundsOf, polygonArea } from './planar-geometry';
import { impactExtent, inundatedStretches } from './river-stretches';

export interface PlanParcelFigures {
  reference: string;
  ownerName: string | null;
  category: PlanCategory;
  /** Area of the outline, m². */
  areaM2: number;
  /** Chainages the outline spans along the centreline. */
  outlineChainage: { from: number; to: number } | null;
  /** The frontage in the register, metres upstream of the structure. */
  frontage: { from: number; to: number } | null;
  maxAffluxM: number | null;
  inundatedWithM: number | null;
  inundatedWithoutM: number | null;
  /** The outline's feature (GeoJSON) or first line (CSV). */
  source: number;
  inRegister: boolean;
}

export interface ParcelPlanView {
  plan: Omit<StoredPlan, 'geometry'> | null;
  drawing: PlanDrawing | null;
  parcels: PlanParcelFigures[];
  withoutOutline: string[];
  events: { name: string; dischargeM3s: number }[];
  event: number;
  impactThresholdM: number;
  revision: { number: number; status: string; preliminary: boolean } | null;
  inundatedLengthM: number;
  extentToM: number | null;
}

/** The plan page's data: the latest plan laid out with every parcel's category and figures for the chosen event. */
/** A drawing as tall as the plan's own shape at this width, between half and one and a half times the width. */
function heightFor(geometry: StoredPlan['geometry'], width: number): number {
  const b = boundsOf([...geometry.centreline.points, ...geometry.outlines.flatMap((o) => o.polygons.flat(2))]);
  const aspect = b && b.maxX > b.minX ? (b.maxY - b.minY) / (b.maxX - b.minX) : 1;
  return Math.round(width * Math.min(1.5, Math.max(0.5, aspect)));
}

export async function parcelPlanView({ user, schemeId, event, width }: { user: SessionUser; schemeId: string; event?: number; width: number }): Promise<ParcelPlanView> {
  const table = await computeParcelImpact({ user, schemeId });
  const stored = await loadParcelPlan(schemeId);
  const largest = table.events.reduce((best, e, i) => (e.dischargeM3s > table.events[best].dischargeM3s ? i : best), 0);
  const chosen = event !== undefined && event >= 1 && event <= table.events.length ? event - 1 : largest;
  const rows = new Map(table.rows.map((r) => [r.parcel.reference.toLowerCase(), r]));
  const levels = table.longSections[chosen]?.points ?? [];
  const inundated = inundatedStretches(levels);
  const extent = impactExtent(levels, table.impactThresholdM);
  const base = { events: table.events, event: chosen + 1, impactThresholdM: table.impactThresholdM, revision: table.revision && { number: table.revision.number, status: table.revision.status, preliminary: table.revision.preliminary }, inundatedLengthM: inundated.reduce((s, x) => s + x.to - x.from, 0), extentToM: extent?.to ?? null };
  if (!stored) return { ...base, plan: null, drawing: null, parcels: [], withoutOutline: table.rows.map((r) => r.parcel.reference) };

  const { geometry, ...plan } = stored;
  const categories = new Map<string, PlanCategory>(table.rows.map((r) => [r.parcel.reference.toLowerCase(), r.category]));
  const parcels = geometry.outlines.map((o): PlanParcelFigures => {
    const row = rows.get(o.reference.toLowerCase());
    const figures = row?.events[chosen];
    return {
      reference: o.reference,
      ownerName: row?.parcel.ownerName ?? null,
      category: row ? row.category : 'not-computed',
      areaM2: o.polygons.reduce((sum, p) => sum + polygonArea(p), 0),
      outlineChainage: chainageRange(geometry.centreline, o.polygons.flat(2)),
      frontage: row ? { from: row.parcel.distanceFromM, to: row.parcel.distanceToM } : null,
      maxAffluxM: figures?.assessed ? figures.maxAfflux : null,
      inundatedWithM: figures?.withScheme?.inundatedLength ?? null,
      inundatedWithoutM: figures?.withoutScheme?.inundatedLength ?? null,
      source: o.source,
      inRegister: row !== undefined || !table.revision,
    };
  });
  const outlined = new Set(geometry.outlines.map((o) => o.reference.toLowerCase()));
  return {
    ...base,
    plan,
    drawing: layOutPlan({ geometry, categories, inundated, extent, width, height: heightFor(geometry, width) }),
    parcels,
    withoutOutline: table.rows.filter((r) => !outlined.has(r.parcel.reference.toLowerCase())).map((r) => r.parcel.reference),
  };
}

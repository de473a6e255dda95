import { PLAN_CSV_COLUMNS } from '@/lib/plan/outlines-csv';
import { MAX_CENTRELINE_VERTICES, MAX_OUTLINE_VERTICES, MAX_PLAN_OUTLINES, MAX_PLAN_VERTICES } from '@/lib/validation/input-limits';

/** What the plan file holds, in either format. */
export function PlanFormats() {
  return (
    <aside className="min-w-0 text-sm text-ink-soft">
      <h2 className="mb-2 text-base font-semibold text-ink">The plan file</h2>
      <p>Easting and northing in metres of one projected coordinate system, named in the form. Outlines are matched to the register by parcel reference; an outline for a parcel not in the register is refused, naming its feature or line.</p>
      <p className="mt-2"><strong className="text-ink">GeoJSON:</strong> a FeatureCollection of Polygon or MultiPolygon features with the property <span className="num">parcel_reference</span>, and one LineString with <span className="num">&quot;centreline&quot;: true</span>, drawn from the structure upstream (optional <span className="num">chainage_start_m</span>, 0 m or less, for a line that starts downstream of the structure).</p>
      <p className="mt-2"><strong className="text-ink">CSV of vertices:</strong> columns <span className="num break-all">{PLAN_CSV_COLUMNS.join(', ')}</span>; one line per vertex in order round each outline, the feature being the parcel reference or the word <span className="num">centreline</span>.</p>
      <p className="mt-2">At most <span className="num">{MAX_PLAN_OUTLINES}</span> outlines of <span className="num">{MAX_OUTLINE_VERTICES}</span> vertices each (<span className="num">{MAX_PLAN_VERTICES.toLocaleString('en-GB')}</span> in all), and a centreline of <span className="num">{MAX_CENTRELINE_VERTICES}</span> vertices.</p>
    </aside>
  );
}

'use client';

import { type ReactNode, useState } from 'react';
import type { ProfilePoint } from '@/lib/hydraulics/profiles/profile-point';
import type { LongSectionData, SectionOutline } from '@/lib/revisions/results-sheet';
import { CrossSectionChart } from '@/components/charts/cross-section-chart';
import { LongSectionChart } from '@/components/charts/long-section-chart';
import { drawingHeight, prismaticOutline } from '@/components/charts/section-outline';

type Props = { data: LongSectionData; profile: ProfilePoint[]; outline: SectionOutline; lengthUnit: string; levelTitle: string; levelWords: string; caption: string };

function nearestSection(outline: Extract<SectionOutline, { kind: 'surveyed' }>, distance: number) {
  return outline.sections.reduce((best, s) => (Math.abs(s.distanceUpstream - distance) < Math.abs(best.distanceUpstream - distance) ? s : best));
}

/** The long-section, and the cross-section at whichever computed point the designer picks. */
export function ProfileViews({ data, profile, outline, lengthUnit: u, levelTitle, levelWords, caption }: Props) {
  const [index, setIndex] = useState(0);
  const [energy, setEnergy] = useState(false);
  const point = profile[Math.min(index, profile.length - 1)];
  let section: ReactNode = null;
  if (point && outline.kind === 'prismatic') {
    const shape = prismaticOutline(outline.section, Math.max(point.depth * 1.25, drawingHeight(outline.section)));
    if (shape) {
      const lift = (p: { x: number; y: number }) => ({ x: p.x, y: p.y + point.bedLevel });
      section = <CrossSectionChart ground={shape.ground.map(lift)} cover={shape.cover?.map(lift) ?? null} waterLevel={point.waterLevel} lengthUnit={u} yTitle={levelTitle} caption={`Cross-section ${point.distanceUpstream.toFixed(0)} ${u} upstream: bed ${point.bedLevel.toFixed(3)} ${u}, water level ${point.waterLevel.toFixed(3)} ${u}, depth ${point.depth.toFixed(3)} ${u}.`} />;
    }
  } else if (point && outline.kind === 'surveyed') {
    const s = nearestSection(outline, point.distanceUpstream);
    section = <CrossSectionChart ground={s.points.map(([x, y]) => ({ x, y }))} bankStations={s.bankStations ?? null} waterLevel={point.waterLevel} lengthUnit={u} yTitle={levelTitle} caption={`Water level ${point.waterLevel.toFixed(3)} ${u} at ${point.distanceUpstream.toFixed(0)} ${u} upstream, drawn on the nearest surveyed section (${s.distanceUpstream} ${u}).`} />;
  }
  return (
    <div className="space-y-6">
      <div>
        <label className="mb-2 flex items-center gap-2 text-sm print:hidden"><input type="checkbox" checked={energy} onChange={(e) => setEnergy(e.target.checked)} /> Show the energy line (water level plus the velocity head)</label>
        <LongSectionChart data={data} lengthUnit={u} levelTitle={levelTitle} levelWords={levelWords} caption={caption} showEnergyLine={energy} />
      </div>
      <div className="grid gap-6 lg:grid-cols-[1fr_2fr]">
        <div>
          <label htmlFor="profile-point" className="block text-sm font-semibold">Cross-section at</label>
          <select id="profile-point" className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm num" value={index} onChange={(e) => setIndex(Number(e.target.value))}>
            {profile.map((p, i) => <option key={i} value={i}>{p.distanceUpstream.toFixed(1)} {u} upstream — depth {p.depth.toFixed(3)} {u}</option>)}
          </select>
          <p className="mt-2 text-xs text-ink-faint">Every point the profile was computed at; the step table below lists the same points.</p>
        </div>
        {section}
      </div>
    </div>
  );
}

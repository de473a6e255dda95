import { type CategoryStyle, PLAN_CATEGORY_STYLES, type PlanCategory } from '@/lib/plan/plan-style';

// The hatches that tell the categories apart without colour, as SVG patterns (one set per drawing, by prefix).

function HatchMarks({ style, size }: { style: CategoryStyle; size: number }) {
  const s = style.stroke;
  if (style.hatch === 'diagonal') return <path d={`M0,${size} L${size},0`} stroke={s} strokeWidth={1} />;
  if (style.hatch === 'cross') return <path d={`M0,${size} L${size},0 M0,0 L${size},${size}`} stroke={s} strokeWidth={1} />;
  if (style.hatch === 'dots') return <circle cx={size / 2} cy={size / 2} r={1} fill={s} />;
  return null;
}

export const hatchId = (prefix: string, category: PlanCategory) => `${prefix}-hatch-${category}`;

export function HatchPatterns({ prefix, size = 8 }: { prefix: string; size?: number }) {
  return (
    <defs>
      {(Object.entries(PLAN_CATEGORY_STYLES) as [PlanCategory, CategoryStyle][]).map(([category, style]) => (
        <pattern key={category} id={hatchId(prefix, category)} width={size} height={size} patternUnits="userSpaceOnUse">
          <rect width={size} height={size} fill={style.fill} />
          <HatchMarks style={style} size={size} />
        </pattern>
      ))}
    </defs>
  );
}

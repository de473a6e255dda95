import { ArrowRightLeft, Ban, CalendarClock, Circle, CircleCheck, CircleDot, CirclePause, CircleAlert, CircleSlash, CircleX, Ellipsis, Hourglass, Info, type LucideIcon, Mail, MailCheck, OctagonAlert, PencilLine, Send, Triangle, TriangleAlert, Undo2 } from 'lucide-react';

// Every status mark comes from one icon set (Lucide, SVG), so none depends on a glyph the shipped fonts lack.
// Each is decorative: the word beside it carries the meaning.
const ICONS = {
  pass: CircleCheck,
  fail: CircleX,
  caution: TriangleAlert,
  note: Info,
  draft: PencilLine,
  returned: Undo2,
  submitted: Hourglass,
  countersigned: CircleCheck,
  issued: CircleCheck,
  superseded: ArrowRightLeft,
  revoked: Ban,
  active: CircleDot,
  invited: Mail,
  disabled: Circle,
  deactivated: Circle,
  // A response's deadline
  overdue: CircleAlert,
  'due soon': CalendarClock,
  // A parcel's impact category
  affected: OctagonAlert,
  'below-threshold': Triangle,
  'not-affected': Circle,
  'outside-reach': Ellipsis,
  // A letter's status
  queued: Hourglass,
  sending: Send,
  sent: CircleCheck,
  failed: CircleX,
  acknowledged: MailCheck,
  held: CirclePause,
  'to-post': PencilLine,
  posted: MailCheck,
  withdrawn: CircleSlash,
} satisfies Record<string, LucideIcon>;

export type StatusIconName = keyof typeof ICONS;

export function isStatusIconName(name: string): name is StatusIconName {
  return Object.hasOwn(ICONS, name);
}

/** A status mark sized to the text around it; `name` outside the set draws a plain dot. */
export function StatusIcon({ name, className = '' }: { name: string; className?: string }) {
  const Icon = isStatusIconName(name) ? ICONS[name] : Circle;
  return <Icon aria-hidden="true" focusable="false" className={`inline-block h-[1em] w-[1em] shrink-0 align-[-0.125em] ${className}`} strokeWidth={2.25} />;
}

import type { CaseUnits } from './case-schema';
import { csvRecords as records } from './csv-records';
import { type SurveyRow, readSurveyRows } from './survey-csv-rows';
import { type SurveySection, surveySections } from './survey-csv-sections';

// A surveyed reach as CSV, one row per ground point:
//   distance_upstream, station, elevation, bank, manning_n
// distance_upstream groups the rows into cross-sections (the first at 0, the control section at the structure);
// stations run left to right looking downstream; bank is blank, "left" or "right"; manning_n applies from its
// point to the next one on the right and may be left blank to carry on the value above it within the section.
// Every problem is reported with its line number and reason, all at once, before anything is stored.

export interface SurveyCsvIssue {
  /** 1-based line in the file; 0 for the file as a whole. */
  line: number;
  message: string;
}

export type SurveyCsvResult =
  | { ok: true; sections: SurveySection[]; rowCount: number }
  | { ok: false; issues: SurveyCsvIssue[] };

export type { SurveySection } from './survey-csv-sections';

export const SURVEY_CSV_COLUMNS = ['distance_upstream', 'station', 'elevation', 'bank', 'manning_n'] as const;
export const MAX_SURVEY_ISSUES = 200;

function capped(issues: SurveyCsvIssue[]): SurveyCsvIssue[] {
  if (issues.length <= MAX_SURVEY_ISSUES) return issues;
  return [...issues.slice(0, MAX_SURVEY_ISSUES), { line: 0, message: `and ${issues.length - MAX_SURVEY_ISSUES} more problems not listed; correct these first` }];
}

/** Parses and checks a survey CSV; lengths are in the scheme's units (m, or ft for US customary). */
export function parseSurveyCsv(text: string, units: CaseUnits): SurveyCsvResult {
  if (text.includes('\u0000')) return { ok: false, issues: [{ line: 0, message: 'is not a text file: a survey CSV is plain text, one row per ground point' }] };
  const read = records(text);
  if ('message' in read) return { ok: false, issues: [read] };
  if (read.records.length === 0) return { ok: false, issues: [{ line: 0, message: `is empty: the first line must name the columns ${SURVEY_CSV_COLUMNS.join(', ')}` }] };
  const rows = readSurveyRows(read.records, read.lines, units);
  // Section checks on a file with unreadable rows would only repeat them ("too few points"), so rows come first.
  if (rows.issues.length > 0) return { ok: false, issues: capped(rows.issues) };
  const sections = surveySections(rows.rows, units);
  if (!sections.ok) return { ok: false, issues: capped(sections.issues) };
  return { ok: true, sections: sections.sections, rowCount: rows.rows.length };
}

export type { SurveyRow };

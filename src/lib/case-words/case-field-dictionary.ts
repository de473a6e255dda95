import type { EditableStep } from '@/lib/validation/scheme-schemas';

// The one dictionary of case-file fields: every path of the case schema (lists written `[]`, pair positions `[0]`, `[1]`)
// with the words a practitioner reads, its unit and the wizard step where it is entered. Screens, messages, e-mails and
// PDFs all name fields through it, so a field is called the same everywhere.

export type UnitKind = 'length' | 'level' | 'depth' | 'discharge' | 'slope' | 'percent' | 'years' | 'area' | 'volume' | 'hours' | 'none';

export interface FieldEntry {
  label: string;
  unit?: UnitKind;
  /** Where it is entered; children inherit it. */
  step?: EditableStep;
  /** Named as a heading before the fields inside it ("proposed structure: sill height"). */
  heading?: boolean;
  /** A list item: named by its own field (`nameField`) or by its place in the list. */
  item?: { nameField?: string };
}

export type CaseFieldPattern =
  | 'format'
  | 'version'
  | 'title'
  | 'units'
  | 'reach'
  | 'reach.kind'
  | 'reach.section'
  | 'reach.section.shape'
  | 'reach.section.width'
  | 'reach.section.bottomWidth'
  | 'reach.section.diameter'
  | 'reach.section.sideSlope'
  | 'reach.section.sideSlopeLeft'
  | 'reach.section.sideSlopeRight'
  | 'reach.manningN'
  | 'reach.bedSlope'
  | 'reach.length'
  | 'reach.bedLevelAtControl'
  | 'reach.energyCoefficient'
  | 'reach.bankHeight'
  | 'reach.sections'
  | 'reach.sections[]'
  | 'reach.sections[].distanceUpstream'
  | 'reach.sections[].points'
  | 'reach.sections[].points[]'
  | 'reach.sections[].points[][0]'
  | 'reach.sections[].points[][1]'
  | 'reach.sections[].manningN'
  | 'reach.sections[].manningN.left'
  | 'reach.sections[].manningN.channel'
  | 'reach.sections[].manningN.right'
  | 'reach.sections[].bankStations'
  | 'reach.sections[].bankStations[0]'
  | 'reach.sections[].bankStations[1]'
  | 'reach.sections[].bankLevel'
  | 'events'
  | 'events[]'
  | 'events[].name'
  | 'events[].discharge'
  | 'events[].annualExceedanceProbability'
  | 'events[].returnPeriod'
  | 'events[].climateChangeAllowance'
  | 'events[].hydrograph'
  | 'events[].hydrograph.kind'
  | 'events[].hydrograph.points'
  | 'events[].hydrograph.points[]'
  | 'events[].hydrograph.points[].time'
  | 'events[].hydrograph.points[].discharge'
  | 'events[].hydrograph.shape'
  | 'events[].hydrograph.timeToPeak'
  | 'control'
  | 'control.type'
  | 'control.depth'
  | 'control.kind'
  | 'control.crestLength'
  | 'control.sillHeight'
  | 'control.coefficient'
  | 'control.coefficientReason'
  | 'control.approachVelocity'
  | 'control.crestBreadth'
  | 'control.noseShape'
  | 'control.channelWidth'
  | 'control.designHead'
  | 'control.piers'
  | 'control.piers.count'
  | 'control.piers.coefficient'
  | 'control.abutmentCoefficient'
  | 'control.tailwaterDepth'
  | 'control.tailwaterLevel'
  | 'control.ratingTable'
  | 'control.ratingTable[]'
  | 'control.ratingTable[][0]'
  | 'control.ratingTable[][1]'
  | 'existingControl'
  | 'existingControl.type'
  | 'existingControl.depth'
  | 'reservoir'
  | 'reservoir.storage'
  | 'reservoir.storage.kind'
  | 'reservoir.storage.rows'
  | 'reservoir.storage.rows[]'
  | 'reservoir.storage.rows[].level'
  | 'reservoir.storage.rows[].area'
  | 'reservoir.storage.rows[].volume'
  | 'reservoir.storage.area'
  | 'reservoir.startLevel'
  | 'reservoir.length'
  | 'profile'
  | 'profile.method'
  | 'profile.normalDepthTolerance'
  | 'profile.frictionSlopeAveraging'
  | 'profile.expansionCoefficient'
  | 'profile.contractionCoefficient'
  | 'impactThreshold'
  | 'minimumMargin'
  | 'limits'
  | 'limits[]'
  | 'limits[].label'
  | 'limits[].distanceUpstream'
  | 'limits[].maxLevel'
  | 'limits[].freeboard'
  | 'sizing'
  | 'sizing.vary'
  | 'sizing.increment'
  | 'sizing.min'
  | 'sizing.max'
  | 'sizing.robust'
  | 'sensitivity'
  | 'sensitivity.manningN'
  | 'sensitivity.discharge'
  | 'sensitivity.coefficient'
  | 'sensitivity.storage'
  | 'sensitivity.hydrographVolume';

export const CASE_FIELDS = {
  format: { label: 'type of file', step: 'scheme' },
  version: { label: 'case-file version', step: 'scheme' },
  title: { label: 'title of the scheme', step: 'scheme' },
  units: { label: 'units', step: 'scheme' },

  reach: { label: 'channel', step: 'channel', heading: true },
  'reach.kind': { label: 'kind of reach (prismatic or surveyed)' },
  'reach.section': { label: 'cross-section shape and size' },
  'reach.section.shape': { label: 'cross-section shape' },
  'reach.section.width': { label: 'width', unit: 'length' },
  'reach.section.bottomWidth': { label: 'bottom width', unit: 'length' },
  'reach.section.diameter': { label: 'diameter', unit: 'length' },
  'reach.section.sideSlope': { label: 'side slope (horizontal per unit rise)', unit: 'none' },
  'reach.section.sideSlopeLeft': { label: 'left side slope (horizontal per unit rise)', unit: 'none' },
  'reach.section.sideSlopeRight': { label: 'right side slope (horizontal per unit rise)', unit: 'none' },
  'reach.manningN': { label: "Manning's n", unit: 'none' },
  'reach.bedSlope': { label: 'bed slope', unit: 'slope' },
  'reach.length': { label: 'length of the reach upstream', unit: 'length', step: 'scheme' },
  'reach.bedLevelAtControl': { label: 'bed level at the structure', unit: 'level', step: 'scheme' },
  'reach.energyCoefficient': { label: 'energy coefficient', unit: 'none' },
  'reach.bankHeight': { label: 'bank height above the bed', unit: 'depth', step: 'limits' },
  'reach.sections': { label: 'surveyed cross-sections' },
  'reach.sections[]': { label: 'cross-section', item: {} },
  'reach.sections[].distanceUpstream': { label: 'distance upstream', unit: 'length' },
  'reach.sections[].points': { label: 'surveyed points' },
  'reach.sections[].points[]': { label: 'point', item: {} },
  'reach.sections[].points[][0]': { label: 'station', unit: 'length' },
  'reach.sections[].points[][1]': { label: 'ground level', unit: 'level' },
  'reach.sections[].manningN': { label: "Manning's n", unit: 'none' },
  'reach.sections[].manningN.left': { label: "Manning's n of the left overbank", unit: 'none' },
  'reach.sections[].manningN.channel': { label: "Manning's n of the main channel", unit: 'none' },
  'reach.sections[].manningN.right': { label: "Manning's n of the right overbank", unit: 'none' },
  'reach.sections[].bankStations': { label: 'bank stations', unit: 'length' },
  'reach.sections[].bankStations[0]': { label: 'left bank station', unit: 'length' },
  'reach.sections[].bankStations[1]': { label: 'right bank station', unit: 'length' },
  'reach.sections[].bankLevel': { label: 'bank level', unit: 'level', step: 'limits' },

  events: { label: 'flood events', step: 'flows' },
  'events[]': { label: 'flood event', item: { nameField: 'name' } },
  'events[].name': { label: 'name' },
  'events[].discharge': { label: 'peak discharge', unit: 'discharge' },
  'events[].annualExceedanceProbability': { label: 'annual exceedance probability (a fraction, 0 to 1)', unit: 'none' },
  'events[].returnPeriod': { label: 'return period', unit: 'years' },
  'events[].climateChangeAllowance': { label: 'climate-change allowance', unit: 'percent' },
  'events[].hydrograph': { label: 'inflow hydrograph', heading: true },
  'events[].hydrograph.kind': { label: 'how the hydrograph is given (a table, or a shape from the peak)' },
  'events[].hydrograph.points': { label: 'time and discharge points' },
  'events[].hydrograph.points[]': { label: 'point', item: {} },
  'events[].hydrograph.points[].time': { label: 'time', unit: 'hours' },
  'events[].hydrograph.points[].discharge': { label: 'inflow', unit: 'discharge' },
  'events[].hydrograph.shape': { label: 'published hydrograph shape' },
  'events[].hydrograph.timeToPeak': { label: 'time to peak', unit: 'hours' },

  control: { label: 'proposed structure', step: 'structure', heading: true },
  'control.type': { label: 'kind of control (weir or fixed depth)' },
  'control.depth': { label: 'depth at the structure', unit: 'depth' },
  'control.kind': { label: 'kind of weir' },
  'control.crestLength': { label: 'crest length', unit: 'length' },
  'control.sillHeight': { label: 'sill height above the bed', unit: 'depth' },
  'control.coefficient': { label: 'discharge coefficient', unit: 'none' },
  'control.coefficientReason': { label: 'source of the coefficient' },
  'control.approachVelocity': { label: 'allow for the approach velocity' },
  'control.crestBreadth': { label: 'crest breadth in the direction of flow', unit: 'length' },
  'control.noseShape': { label: 'shape of the upstream edge' },
  'control.channelWidth': { label: 'approach channel width', unit: 'length' },
  'control.designHead': { label: 'design head', unit: 'length' },
  'control.piers': { label: 'piers' },
  'control.piers.count': { label: 'number of piers', unit: 'none' },
  'control.piers.coefficient': { label: 'pier contraction coefficient', unit: 'none' },
  'control.abutmentCoefficient': { label: 'abutment contraction coefficient', unit: 'none' },
  'control.tailwaterDepth': { label: 'tailwater depth above the bed downstream', unit: 'depth' },
  'control.tailwaterLevel': { label: 'tailwater depth (its old name)', unit: 'depth' },
  'control.ratingTable': { label: 'rating table' },
  'control.ratingTable[]': { label: 'rating-table row', item: {} },
  'control.ratingTable[][0]': { label: 'level above the crest', unit: 'length' },
  'control.ratingTable[][1]': { label: 'discharge', unit: 'discharge' },

  existingControl: { label: 'existing control downstream', step: 'structure', heading: true },
  'existingControl.type': { label: 'kind of control' },
  'existingControl.depth': { label: 'depth at the structure without the scheme', unit: 'depth' },

  reservoir: { label: 'reservoir behind the spillway', step: 'structure', heading: true },
  'reservoir.storage': { label: 'storage' },
  'reservoir.storage.kind': { label: 'how the storage is given (level and area, level and volume, or a constant area)' },
  'reservoir.storage.rows': { label: 'storage table' },
  'reservoir.storage.rows[]': { label: 'storage-table row', item: {} },
  'reservoir.storage.rows[].level': { label: 'water level', unit: 'level' },
  'reservoir.storage.rows[].area': { label: 'surface area', unit: 'area' },
  'reservoir.storage.rows[].volume': { label: 'volume stored', unit: 'volume' },
  'reservoir.storage.area': { label: 'surface area', unit: 'area' },
  'reservoir.startLevel': { label: 'level at the start of the flood', unit: 'level' },
  'reservoir.length': { label: 'length of the reservoir upstream of the spillway', unit: 'length' },

  profile: { label: 'profile calculation', step: 'channel', heading: true },
  'profile.method': { label: 'method (direct step or standard step)' },
  'profile.normalDepthTolerance': { label: 'normal-depth tolerance (a fraction of the normal depth)', unit: 'none' },
  'profile.frictionSlopeAveraging': { label: 'friction-slope averaging' },
  'profile.expansionCoefficient': { label: 'expansion loss coefficient', unit: 'none' },
  'profile.contractionCoefficient': { label: 'contraction loss coefficient', unit: 'none' },

  impactThreshold: { label: 'afflux threshold', unit: 'length', step: 'limits' },
  minimumMargin: { label: 'minimum room below every limit', unit: 'length', step: 'limits' },

  limits: { label: 'flood-level limits', step: 'limits' },
  'limits[]': { label: 'flood-level limit', item: { nameField: 'label' } },
  'limits[].label': { label: 'place name' },
  'limits[].distanceUpstream': { label: 'distance upstream', unit: 'length' },
  'limits[].maxLevel': { label: 'highest allowed level', unit: 'level' },
  'limits[].freeboard': { label: 'freeboard', unit: 'length' },

  sizing: { label: 'crest sizing', step: 'limits', heading: true },
  'sizing.vary': { label: 'dimension to size (sill height or crest length)' },
  'sizing.increment': { label: 'step between sizes tried', unit: 'length' },
  'sizing.min': { label: 'smallest size', unit: 'length' },
  'sizing.max': { label: 'largest size', unit: 'length' },
  'sizing.robust': { label: 'size so every sensitivity run passes' },

  sensitivity: { label: 'sensitivity runs', step: 'limits', heading: true },
  'sensitivity.manningN': { label: "change in Manning's n", unit: 'percent' },
  'sensitivity.discharge': { label: 'change in discharge', unit: 'percent' },
  'sensitivity.coefficient': { label: 'change in the weir coefficient', unit: 'percent' },
  'sensitivity.storage': { label: "change in the reservoir's storage", unit: 'percent' },
  'sensitivity.hydrographVolume': { label: "change in the hydrograph's volume (same peak)", unit: 'percent' },
} satisfies Record<string, FieldEntry> as Record<string, FieldEntry> & Record<CaseFieldPattern, FieldEntry>;

/** Names the engine uses for its own checks, read as the case fields they concern. */
export const ENGINE_ALIASES: Record<string, string> = {
  'reach[]': 'reach.sections[]',
  'reach.sections[].points[].station': 'reach.sections[].points[][0]',
  'reach.sections[].points[].elevation': 'reach.sections[].points[][1]',
  'reach.sections[].bedLevel': 'reach.sections[].points',
  'profile.frictionAveraging': 'profile.frictionSlopeAveraging',
  'sizing.upper': 'sizing.max',
  withoutScheme: 'existingControl',
  'withoutScheme.controlDepth': 'existingControl.depth',
};

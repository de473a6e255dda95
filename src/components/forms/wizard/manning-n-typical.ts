// Typical values of Manning's n to start from, each with its published source. The designer confirms the value
// for the site; these are the "normal" values of the table, recalled from memory — check them against it.
export const MANNING_N_SOURCE = 'Chow, V. T., Open-Channel Hydraulics, McGraw-Hill, 1959, Table 5-6 (normal values; recalled from memory, check against the table)';

export const TYPICAL_MANNING_N: { description: string; n: number }[] = [
  { description: 'Concrete, trowel finish', n: 0.013 },
  { description: 'Concrete, float finish', n: 0.015 },
  { description: 'Brick in cement mortar', n: 0.015 },
  { description: 'Excavated earth channel, straight and uniform, clean', n: 0.022 },
  { description: 'Excavated earth channel, short grass, few weeds', n: 0.027 },
  { description: 'Excavated earth channel, winding and sluggish, grass and some weeds', n: 0.03 },
  { description: 'Natural stream, clean, straight, full stage, no deep pools', n: 0.03 },
  { description: 'Natural stream, as above with more stones and weeds', n: 0.035 },
  { description: 'Natural stream, clean, winding, some pools and shoals', n: 0.04 },
  { description: 'Natural stream, sluggish reaches, weedy, deep pools', n: 0.07 },
  { description: 'Floodplain, pasture with short grass', n: 0.03 },
  { description: 'Floodplain, mature field crops', n: 0.04 },
  { description: 'Floodplain, light brush and trees, in summer', n: 0.06 },
];

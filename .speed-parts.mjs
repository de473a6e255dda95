// src/lib/hydraulics/units.ts
var GRAVITY = 9.80665;
var METRES_PER_FOOT = 0.3048;
var CUBIC_METRES_PER_CUBIC_FOOT = METRES_PER_FOOT ** 3;
var MANNING_US_FACTOR = (1 / METRES_PER_FOOT) ** (1 / 3);

// src/lib/hydraulics/errors.ts
var EngineError = class extends Error {
  constructor(message, field, code) {
    super(message);
    this.field = field;
    this.code = code;
    this.name = new.target.name;
  }
  field;
  code;
};
var InvalidInputError = class extends EngineError {
  constructor(field, reason) {
    super(`${field}: ${reason}`, field, "invalid-input");
  }
};
var NoPhysicalSolutionError = class extends EngineError {
  constructor(field, code, explanation) {
    super(`${field}: ${explanation}`, field, code);
  }
};
function requirePositive(value, field) {
  if (typeof value !== "number" || !Number.isFinite(value)) throw new InvalidInputError(field, "must be a finite number");
  if (value <= 0) throw new InvalidInputError(field, "must be greater than 0");
}
function requireNonNegative(value, field) {
  if (typeof value !== "number" || !Number.isFinite(value)) throw new InvalidInputError(field, "must be a finite number");
  if (value < 0) throw new InvalidInputError(field, "must be 0 or more");
}
function requireFinite(value, field) {
  if (typeof value !== "number" || !Number.isFinite(value)) throw new InvalidInputError(field, "must be a finite number");
}

// src/lib/hydraulics/manning.ts
function manningConveyance(area, wettedPerimeter, manningN) {
  if (area <= 0 || wettedPerimeter <= 0) return 0;
  return area * Math.pow(area / wettedPerimeter, 2 / 3) / manningN;
}

// src/lib/hydraulics/solvers.ts
var DEFAULT_FIELD = "solver";
function evaluated(f, x, field) {
  const value = f(x);
  if (!Number.isFinite(value)) {
    throw new EngineError(`${field}: the equation gave a non-finite value at x = ${x}`, field, "non-finite");
  }
  return value;
}
function sameSign(a, b) {
  return a > 0 && b > 0 || a < 0 && b < 0;
}
function brentRoot(f, lo, hi, opts = {}) {
  const field = opts.field ?? DEFAULT_FIELD;
  const tolerance = opts.tolerance ?? 1e-12;
  const maxIterations = opts.maxIterations ?? 500;
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) {
    throw new EngineError(`${field}: the bracket [${lo}, ${hi}] is not finite`, field, "no-bracket");
  }
  let a = lo;
  let b = hi;
  let fa = evaluated(f, a, field);
  let fb = evaluated(f, b, field);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (sameSign(fa, fb)) {
    throw new EngineError(`${field}: f(${lo}) and f(${hi}) have the same sign, so no root is bracketed`, field, "no-bracket");
  }
  let c = b;
  let fc = fb;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    if (sameSign(fb, fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tolerance1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
    const halfInterval = 0.5 * (c - b);
    if (Math.abs(halfInterval) <= tolerance1 || fb === 0) return b;
    if (Math.abs(e) >= tolerance1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p2;
      let q;
      if (a === c) {
        p2 = 2 * halfInterval * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p2 = s * (2 * halfInterval * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p2 > 0) q = -q;
      p2 = Math.abs(p2);
      if (2 * p2 < Math.min(3 * halfInterval * q - Math.abs(tolerance1 * q), Math.abs(e * q))) {
        e = d;
        d = p2 / q;
      } else {
        d = halfInterval;
        e = d;
      }
    } else {
      d = halfInterval;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tolerance1 ? d : Math.sign(halfInterval) * tolerance1;
    fb = evaluated(f, b, field);
  }
  throw new EngineError(`${field}: no convergence within ${maxIterations} iterations`, field, "no-convergence");
}
function expandBracketUpward(f, lo, hiStart, opts = {}) {
  const field = opts.field ?? DEFAULT_FIELD;
  const factor = opts.factor ?? 2;
  const maxHi = opts.maxHi ?? 1e6;
  if (!(factor > 1) || !Number.isFinite(factor)) throw new EngineError(`${field}: the growth factor must be above 1`, field, "no-bracket");
  if (!(hiStart > lo) || !Number.isFinite(lo) || !Number.isFinite(hiStart)) {
    throw new EngineError(`${field}: the starting bracket [${lo}, ${hiStart}] is not increasing`, field, "no-bracket");
  }
  const fLo = evaluated(f, lo, field);
  if (fLo === 0) return [lo, lo];
  let previous = lo;
  let hi = Math.min(hiStart, maxHi);
  for (let step = 0; step < 2e3; step++) {
    const fHi = evaluated(f, hi, field);
    if (!sameSign(fLo, fHi)) return [previous, hi];
    if (hi >= maxHi) return null;
    previous = hi;
    hi = Math.min(lo + factor * (hi - lo), maxHi);
  }
  return null;
}

// src/lib/hydraulics/prismatic/circle-geometry.ts
function circleCentralAngle(diameter, depth) {
  const ratio = Math.min(Math.max(depth / diameter, 0), 1);
  return 2 * Math.acos(1 - 2 * ratio);
}
function circleGeometry(diameter, depth) {
  const y = Math.min(depth, diameter);
  const theta = circleCentralAngle(diameter, y);
  const halfSine = Math.sin(theta / 2);
  const area = diameter * diameter * (theta - Math.sin(theta)) / 8;
  return {
    depth,
    area,
    wettedPerimeter: theta * diameter / 2,
    topWidth: y >= diameter ? 0 : diameter * halfSine,
    firstMoment: Math.max(0, area * (y - diameter / 2) + diameter ** 3 * halfSine ** 3 / 12)
  };
}
var CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO = (() => {
  const theta = brentRoot((t) => 3 * t - 5 * t * Math.cos(t) + 2 * Math.sin(t), Math.PI, 2 * Math.PI - 1e-9, { field: "circle.peakConveyance" });
  return (1 - Math.cos(theta / 2)) / 2;
})();

// src/lib/hydraulics/prismatic/trapezoid-geometry.ts
function trapezoidGeometry({ bottomWidth: b, sideSlopeLeft: zL, sideSlopeRight: zR }, depth) {
  const y = depth;
  const zSum = zL + zR;
  return {
    depth: y,
    area: b * y + zSum * y * y / 2,
    wettedPerimeter: b + y * (Math.hypot(1, zL) + Math.hypot(1, zR)),
    topWidth: b + zSum * y,
    firstMoment: b * y * y / 2 + zSum * y * y * y / 6
  };
}

// src/lib/hydraulics/prismatic/shape-spec.ts
var SHAPES = ["rectangular", "trapezoidal", "triangular", "circular"];
function sideSlopes(spec, field) {
  const left = spec.sideSlopeLeft ?? spec.sideSlope;
  const right = spec.sideSlopeRight ?? spec.sideSlope;
  if (left === void 0 || right === void 0) {
    throw new InvalidInputError(`${field}.sideSlope`, "is required (or give both sideSlopeLeft and sideSlopeRight)");
  }
  requireNonNegative(left, `${field}.${spec.sideSlopeLeft === void 0 ? "sideSlope" : "sideSlopeLeft"}`);
  requireNonNegative(right, `${field}.${spec.sideSlopeRight === void 0 ? "sideSlope" : "sideSlopeRight"}`);
  return { left, right };
}
function validatedShape(spec, field) {
  if (spec === null || typeof spec !== "object") throw new InvalidInputError(field, "must be an object describing the section");
  const shape = spec.shape;
  if (!SHAPES.some((known) => known === shape)) {
    throw new InvalidInputError(`${field}.shape`, `must be one of ${SHAPES.join(", ")}`);
  }
  switch (spec.shape) {
    case "rectangular":
      requirePositive(spec.width, `${field}.width`);
      return { kind: "open", shape: "rectangular", dimensions: { bottomWidth: spec.width, sideSlopeLeft: 0, sideSlopeRight: 0 } };
    case "trapezoidal": {
      requirePositive(spec.bottomWidth, `${field}.bottomWidth`);
      const { left, right } = sideSlopes(spec, field);
      return { kind: "open", shape: "trapezoidal", dimensions: { bottomWidth: spec.bottomWidth, sideSlopeLeft: left, sideSlopeRight: right } };
    }
    case "triangular": {
      const { left, right } = sideSlopes(spec, field);
      if (left + right <= 0) throw new InvalidInputError(`${field}.sideSlope`, "must be greater than 0 on at least one side");
      return { kind: "open", shape: "triangular", dimensions: { bottomWidth: 0, sideSlopeLeft: left, sideSlopeRight: right } };
    }
    case "circular":
      requirePositive(spec.diameter, `${field}.diameter`);
      return { kind: "circular", diameter: spec.diameter };
  }
}

// src/lib/hydraulics/section-state.ts
function sectionState(geometry, conveyance, energyCoefficient, overtopped2) {
  const { area, wettedPerimeter, topWidth } = geometry;
  const hydraulicRadius = wettedPerimeter > 0 ? area / wettedPerimeter : 0;
  const hydraulicDepth = area <= 0 ? 0 : topWidth > 0 ? area / topWidth : Infinity;
  const finite2 = Number.isFinite(area) && Number.isFinite(wettedPerimeter) && Number.isFinite(topWidth) && Number.isFinite(geometry.firstMoment) && Number.isFinite(hydraulicRadius) && Number.isFinite(conveyance) && Number.isFinite(energyCoefficient);
  if (!finite2 || Number.isNaN(hydraulicDepth)) {
    throw new InvalidInputError("depth", `${geometry.depth} m gives section properties beyond the range of double precision (check the units)`);
  }
  return { depth: geometry.depth, area, wettedPerimeter, topWidth, firstMoment: geometry.firstMoment, hydraulicRadius, hydraulicDepth, conveyance, energyCoefficient, overtopped: overtopped2 };
}
function requireDepth(depth, field = "depth") {
  requireFinite(depth, field);
  if (depth < 0) throw new InvalidInputError(field, "must be 0 or more");
}

// src/lib/hydraulics/prismatic-sections.ts
function prismaticSection(spec, manningN, opts = {}) {
  const field = opts.field ?? "reach.section";
  const shape = validatedShape(spec, field);
  requirePositive(manningN, opts.nField ?? "reach.manningN");
  const energyCoefficient = opts.energyCoefficient ?? 1;
  const alphaField = opts.energyCoefficientField ?? "reach.energyCoefficient";
  requireFinite(energyCoefficient, alphaField);
  if (energyCoefficient < 1) throw new InvalidInputError(alphaField, "must be 1 or more");
  const geometryAt = shape.kind === "circular" ? (depth) => circleGeometry(shape.diameter, depth) : (depth) => trapezoidGeometry(shape.dimensions, depth);
  const maxDepth = shape.kind === "circular" ? shape.diameter : Infinity;
  const sampleInto = shape.kind === "circular" ? circleSampler(shape.diameter, manningN, energyCoefficient) : trapezoidSampler(shape.dimensions, manningN, energyCoefficient);
  return {
    shape: shape.kind === "circular" ? "circular" : shape.shape,
    invertLevel: 0,
    maxDepth,
    manningN,
    stateAtDepth(depth) {
      requireDepth(depth);
      const geometry = geometryAt(depth);
      const conveyance = manningConveyance(geometry.area, geometry.wettedPerimeter, manningN);
      return sectionState(geometry, conveyance, energyCoefficient, depth > maxDepth);
    },
    sampleInto
  };
}
function trapezoidSampler(dimensions, manningN, energyCoefficient) {
  const { bottomWidth: b, sideSlopeLeft: zL, sideSlopeRight: zR } = dimensions;
  const zSum = zL + zR;
  const perimeterPerDepth = Math.hypot(1, zL) + Math.hypot(1, zR);
  return (depth, out) => {
    requireDepth(depth);
    const area = b * depth + zSum * depth * depth / 2;
    out.area = area;
    out.topWidth = b + zSum * depth;
    out.conveyance = manningConveyance(area, b + depth * perimeterPerDepth, manningN);
    out.energyCoefficient = energyCoefficient;
  };
}
function circleSampler(diameter, manningN, energyCoefficient) {
  return (depth, out) => {
    requireDepth(depth);
    const geometry = circleGeometry(diameter, depth);
    out.area = geometry.area;
    out.topWidth = geometry.topWidth;
    out.conveyance = manningConveyance(geometry.area, geometry.wettedPerimeter, manningN);
    out.energyCoefficient = energyCoefficient;
  };
}

// src/lib/hydraulics/flow-properties.ts
function wettedState(section2, depth, discharge, fields = {}) {
  const depthField = fields.depthField ?? "depth";
  requireFinite(depth, depthField);
  if (depth <= 0) throw new InvalidInputError(depthField, "must be greater than 0");
  requireNonNegative(discharge, fields.dischargeField ?? "discharge");
  const state = section2.stateAtDepth(depth);
  if (!(state.area > 0) || !(state.conveyance > 0)) throw new InvalidInputError(depthField, `is too small to give any flow area (${depth} m)`);
  return state;
}
function finite(value, fields = {}) {
  if (!Number.isFinite(value)) throw new InvalidInputError(fields.dischargeField ?? "discharge", "is out of range for this section (the result overflows)");
  return value;
}
function flowVelocity(section2, depth, discharge, fields) {
  return finite(discharge / wettedState(section2, depth, discharge, fields).area, fields);
}
function froudeNumber(section2, depth, discharge, fields) {
  const state = wettedState(section2, depth, discharge, fields);
  const velocity = discharge / state.area;
  return finite(velocity * Math.sqrt(state.energyCoefficient * state.topWidth / (GRAVITY * state.area)), fields);
}
function specificEnergy(section2, depth, discharge, fields) {
  const state = wettedState(section2, depth, discharge, fields);
  const velocity = discharge / state.area;
  return finite(depth + state.energyCoefficient * velocity * velocity / (2 * GRAVITY), fields);
}
function specificForce(section2, depth, discharge, fields) {
  const state = wettedState(section2, depth, discharge, fields);
  return finite(discharge * (discharge / state.area) / GRAVITY + state.firstMoment, fields);
}
function frictionSlope(section2, depth, discharge, fields) {
  const state = wettedState(section2, depth, discharge, fields);
  return finite((discharge / state.conveyance) ** 2, fields);
}

// src/lib/hydraulics/depth-brackets.ts
var UNIFORM_STEPS = 400;
var SHALLOWEST_FRACTION = 1e-9;
var MAX_HALVINGS = 1100;
var DEEPEST_OPEN_DEPTH = 1e5;
function hasBreakpoints(section2) {
  return "breakpointDepths" in section2 && Array.isArray(section2.breakpointDepths);
}
function finiteDepthGrid(section2, from = 0, to = section2.maxDepth) {
  const span = to - from;
  const depths = [to];
  for (let i = 1; i < UNIFORM_STEPS; i++) depths.push(from + span * i / UNIFORM_STEPS);
  for (let fraction = SHALLOWEST_FRACTION; fraction < 1 / UNIFORM_STEPS; fraction *= 2) depths.push(from + span * fraction);
  if (hasBreakpoints(section2)) {
    const inside = section2.breakpointDepths.filter((d) => d > from && d < to);
    depths.push(...inside, ...inside.map((d) => Math.min(to, d + span * SHALLOWEST_FRACTION)));
  }
  return [...new Set(depths)].sort((a, b) => a - b);
}
function downwardBracket(f, start) {
  const startValue = f(start);
  let higher = start;
  for (let i = 0; i < MAX_HALVINGS; i++) {
    const lower = higher / 2;
    if (lower <= 0) return null;
    const value = f(lower);
    if (value === 0 || value < 0 !== startValue < 0) return [lower, higher];
    higher = lower;
  }
  return null;
}
function openDepthBracket(f, field) {
  const startDepth = 1;
  if (f(startDepth) < 0) return expandBracketUpward(f, startDepth, 2 * startDepth, { maxHi: DEEPEST_OPEN_DEPTH, field });
  return downwardBracket(f, startDepth);
}

// src/lib/hydraulics/root-scan.ts
function oppositeSigns(a, b) {
  return a < 0 && b > 0 || a > 0 && b < 0;
}
function signChangeBrackets(f, grid) {
  const brackets = [];
  let previousX = grid[0];
  let previousF = f(previousX);
  if (previousF === 0) brackets.push([previousX, previousX]);
  for (let i = 1; i < grid.length; i++) {
    const value = f(grid[i]);
    if (value === 0) brackets.push([grid[i], grid[i]]);
    else if (oppositeSigns(previousF, value)) brackets.push([previousX, grid[i]]);
    previousX = grid[i];
    previousF = value;
  }
  return brackets;
}
function firstSignChange(f, grid) {
  let previousX = grid[0];
  let previousF = f(previousX);
  if (previousF === 0) return [previousX, previousX];
  for (let i = 1; i < grid.length; i++) {
    const value = f(grid[i]);
    if (value === 0) return [grid[i], grid[i]];
    if (oppositeSigns(previousF, value)) return [previousX, grid[i]];
    previousX = grid[i];
    previousF = value;
  }
  return null;
}
function rootInBracket(f, bracket, field) {
  const [a, b] = bracket;
  if (a === b) return a;
  return brentRoot(f, Math.min(a, b), Math.max(a, b), { tolerance: 1e-14 * Math.max(Math.abs(a), Math.abs(b)), field });
}

// src/lib/hydraulics/section-sample.ts
function emptySample() {
  return { area: 0, topWidth: 0, conveyance: 0, energyCoefficient: 1 };
}
function sampleSection(section2, depth, out) {
  if (section2.sampleInto !== void 0) {
    section2.sampleInto(depth, out);
    return out;
  }
  const state = section2.stateAtDepth(depth);
  out.area = state.area;
  out.topWidth = state.topWidth;
  out.conveyance = state.conveyance;
  out.energyCoefficient = state.energyCoefficient;
  return out;
}

// src/lib/hydraulics/normal-depth.ts
var scratch = emptySample();
function uniformFlowCapacity(section2, depth, bedSlope) {
  requireDepth(depth);
  return sampleSection(section2, depth, scratch).conveyance * Math.sqrt(bedSlope);
}
function capacityExceeded(field, discharge, capacity, detail) {
  return new NoPhysicalSolutionError(
    field,
    "exceeds-capacity",
    `no normal depth: ${discharge} m\xB3/s is more than the section can carry in uniform flow (${capacity.toPrecision(4)} m\xB3/s ${detail})`
  );
}
function circularBracket(section2, residual, discharge, bedSlope, field) {
  const peakDepth = CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO * section2.maxDepth;
  if (residual(peakDepth) < 0) {
    const peak = uniformFlowCapacity(section2, peakDepth, bedSlope);
    const full = uniformFlowCapacity(section2, section2.maxDepth, bedSlope);
    throw capacityExceeded(field, discharge, peak, `at its best depth ${(peakDepth / section2.maxDepth).toFixed(3)} D; full-bore capacity ${full.toPrecision(4)} m\xB3/s`);
  }
  return [0, peakDepth];
}
function surveyedBracket(section2, residual, discharge, bedSlope, field) {
  const bracket = firstSignChange(residual, [0, ...finiteDepthGrid(section2)]);
  if (bracket === null) {
    throw capacityExceeded(field, discharge, uniformFlowCapacity(section2, section2.maxDepth, bedSlope), "with the water at the lower end of the section");
  }
  return bracket;
}
function normalDepth(section2, discharge, bedSlope, opts = {}) {
  const slopeField = opts.field ?? "reach.bedSlope";
  const dischargeField = opts.dischargeField ?? "discharge";
  requirePositive(discharge, dischargeField);
  requireFinite(bedSlope, slopeField);
  if (bedSlope <= 0) {
    const bed = bedSlope === 0 ? "horizontal" : "adverse";
    throw new NoPhysicalSolutionError(slopeField, "no-normal-depth", `no normal depth: the bed is ${bed}, uniform flow cannot exist`);
  }
  const residual = (y) => uniformFlowCapacity(section2, y, bedSlope) - discharge;
  let bracket;
  if (section2.maxDepth === Infinity) bracket = openDepthBracket(residual, dischargeField);
  else if (section2.shape === "circular") bracket = circularBracket(section2, residual, discharge, bedSlope, dischargeField);
  else bracket = surveyedBracket(section2, residual, discharge, bedSlope, dischargeField);
  if (bracket !== null && bracket[0] === 0) bracket = downwardBracket(residual, bracket[1]);
  if (bracket === null) {
    throw new NoPhysicalSolutionError(dischargeField, "depth-out-of-range", `no normal depth below ${DEEPEST_OPEN_DEPTH} m: check the discharge and its units`);
  }
  return rootInBracket(residual, bracket, dischargeField);
}

// src/lib/hydraulics/critical-depth.ts
var ROOT_CHECK = 1e-6;
function atBreakpoint(section2, y) {
  const breakpoints = hasBreakpoints(section2) ? section2.breakpointDepths : [];
  return breakpoints.some((d) => Math.abs(d - y) <= 1e-8 * section2.maxDepth);
}
function isCriticalRoot(section2, y, discharge, momentumOnly) {
  if (!(y > 0)) return false;
  const state = section2.stateAtDepth(y);
  if (!(state.area > 0)) return false;
  const alpha = momentumOnly ? 1 : state.energyCoefficient;
  const froude = discharge / state.area * Math.sqrt(alpha * state.topWidth / (GRAVITY * state.area));
  return Math.abs(froude - 1) <= ROOT_CHECK || !atBreakpoint(section2, y);
}
function criticalResidual(section2, discharge, momentumOnly = false) {
  const rootGravity = Math.sqrt(GRAVITY);
  const sample = emptySample();
  return (y) => {
    requireDepth(y);
    const state = sampleSection(section2, y, sample);
    const alpha = momentumOnly ? 1 : state.energyCoefficient;
    return rootGravity * state.area ** 1.5 - discharge * Math.sqrt(alpha * state.topWidth);
  };
}
function finiteSectionBrackets(section2, residual) {
  const grid = finiteDepthGrid(section2);
  const shallowest = residual(grid[0]) >= 0 ? downwardBracket(residual, grid[0]) : null;
  return [...shallowest ? [shallowest] : [], ...signChangeBrackets(residual, grid)];
}
function residualRoots(section2, residual, isRoot, field) {
  if (section2.maxDepth === Infinity) {
    const bracket = openDepthBracket(residual, field);
    if (bracket === null) throw new NoPhysicalSolutionError(field, "depth-out-of-range", `no critical depth below ${DEEPEST_OPEN_DEPTH} m: check the discharge and its units`);
    return [rootInBracket(residual, bracket, field)];
  }
  const roots = finiteSectionBrackets(section2, residual).map((bracket) => rootInBracket(residual, bracket, field));
  return [...new Set(roots)].filter(isRoot).sort((a, b) => a - b);
}
function criticalDepths(section2, discharge, opts = {}) {
  const field = opts.field ?? "reach.section";
  const dischargeField = opts.dischargeField ?? "discharge";
  requirePositive(discharge, dischargeField);
  const isRoot = (y) => isCriticalRoot(section2, y, discharge, false);
  const roots = residualRoots(section2, criticalResidual(section2, discharge), isRoot, dischargeField);
  if (roots.length === 0) {
    throw new NoPhysicalSolutionError(
      field,
      "section-overtopped",
      `critical depth for ${discharge} m\xB3/s lies above the top of the section (${section2.maxDepth.toPrecision(4)} m deep): the flow would overtop it`
    );
  }
  return roots;
}
function criticalDepth(section2, discharge, opts = {}) {
  const roots = criticalDepths(section2, discharge, opts);
  const energies = roots.map((y) => specificEnergy(section2, y, discharge));
  return roots[energies.indexOf(Math.min(...energies))];
}

// src/lib/hydraulics/slope-class.ts
function classifySlope(bedSlope, normalDepth2, criticalDepth2, opts = {}) {
  const field = opts.field ?? "reach.bedSlope";
  const tolerance = opts.relativeTolerance ?? 1e-3;
  requireFinite(bedSlope, field);
  requirePositive(criticalDepth2, "criticalDepth");
  requireFinite(tolerance, "relativeTolerance");
  if (tolerance < 0) throw new InvalidInputError("relativeTolerance", "must be 0 or more");
  if (bedSlope === 0) return "horizontal";
  if (bedSlope < 0) return "adverse";
  if (normalDepth2 === null) throw new InvalidInputError("normalDepth", "is required when the bed falls in the direction of flow");
  requirePositive(normalDepth2, "normalDepth");
  if (Math.abs(normalDepth2 - criticalDepth2) <= tolerance * criticalDepth2) return "critical";
  return normalDepth2 > criticalDepth2 ? "mild" : "steep";
}

// src/lib/hydraulics/sequent-depth.ts
function momentumMinimumDepth(section2, discharge, field) {
  const isRoot = (y) => isCriticalRoot(section2, y, discharge, true);
  const roots = residualRoots(section2, criticalResidual(section2, discharge, true), isRoot, field);
  if (roots.length === 0) return null;
  const forces = roots.map((y) => specificForce(section2, y, discharge));
  return roots[forces.indexOf(Math.min(...forces))];
}
function overtopped(field, depth, section2) {
  return new NoPhysicalSolutionError(
    field,
    "section-overtopped",
    `the depth sequent to ${depth.toPrecision(4)} m lies above the top of the section (${section2.maxDepth.toPrecision(4)} m deep)`
  );
}
function bracketAbove(section2, excess, from, field) {
  if (section2.maxDepth === Infinity) return expandBracketUpward(excess, from, 2 * from, { maxHi: DEEPEST_OPEN_DEPTH, field });
  return firstSignChange(excess, [from, ...finiteDepthGrid(section2, from)]);
}
function sequentDepth(section2, depth, discharge, opts = {}) {
  const field = opts.field ?? "reach.section";
  const fields = { depthField: opts.depthField, dischargeField: opts.dischargeField };
  requirePositive(discharge, opts.dischargeField ?? "discharge");
  wettedState(section2, depth, discharge, fields);
  if (depth > section2.maxDepth) throw overtopped(field, depth, section2);
  const pivot = momentumMinimumDepth(section2, discharge, opts.dischargeField ?? "discharge");
  if (pivot === null) throw overtopped(field, depth, section2);
  if (Math.abs(depth - pivot) <= 1e-12 * pivot) return depth;
  const force = specificForce(section2, depth, discharge);
  const excess = (y) => specificForce(section2, y, discharge) - force;
  const bracket = depth < pivot ? bracketAbove(section2, excess, pivot, field) : downwardBracket(excess, pivot);
  if (bracket === null) throw overtopped(field, depth, section2);
  return rootInBracket(excess, bracket, field);
}

// src/lib/hydraulics/weirs/submergence.ts
var BROAD_CRESTED_MODULAR_LIMIT = 2 / 3;

// src/lib/hydraulics/weirs/broad-crested.ts
var BROAD_CREST_FACTOR = 2 / 3 * Math.sqrt(2 / 3 * GRAVITY);

// src/lib/hydraulics/weirs/ogee-coefficients.ts
var US_TO_SI_WEIR_COEFFICIENT = Math.sqrt(METRES_PER_FOOT);

// src/lib/hydraulics/weirs/sharp-crested.ts
var THIN_PLATE_FACTOR = 2 / 3 * Math.sqrt(2 * GRAVITY);

// src/lib/hydraulics/profiles/depth-grid.ts
function geometricDepths(from, towards, normalDepth2, steps) {
  const side = from > normalDepth2 ? 1 : -1;
  const first = Math.abs(from - normalDepth2);
  const ratio = Math.pow(Math.abs(towards - normalDepth2) / first, 1 / steps);
  return (k) => k === 0 ? from : k === steps ? towards : normalDepth2 + side * first * Math.pow(ratio, k);
}
function proportionalDepths(from, towards, steps) {
  const ratio = Math.pow(towards / from, 1 / steps);
  return (k) => k === 0 ? from : k === steps ? towards : from * Math.pow(ratio, k);
}

// src/lib/hydraulics/profiles/march-table.ts
var MarchTable = class {
  constructor(section2, discharge) {
    this.section = section2;
    this.discharge = discharge;
  }
  section;
  discharge;
  depth = [];
  distance = [];
  /** Specific energy y + αV²/2g, m. */
  energy = [];
  /** Friction slope (Q/K)². */
  friction = [];
  area = [];
  topWidth = [];
  energyCoefficient = [];
  count = 0;
  sample = emptySample();
  /**
   * Evaluates `depth` into slot i: E = y + αV²/(2g) with V = Q/A (Chow, Open-Channel Hydraulics, 1959, §3-2 — from
   * memory) and Sf = (Q/K)² (Manning's formula solved for the energy slope; Chow 1959, §10-1 — from memory).
   */
  evaluate(i, depth) {
    const { section: section2, discharge, sample } = this;
    sampleSection(section2, depth, sample);
    if (!(depth > 0) || !(sample.area > 0) || !(sample.conveyance > 0)) wettedState(section2, depth, discharge);
    const velocity = discharge / sample.area;
    const energy = depth + sample.energyCoefficient * velocity * velocity / (2 * GRAVITY);
    const friction = (discharge / sample.conveyance) ** 2;
    if (!Number.isFinite(energy) || !Number.isFinite(friction)) throw new InvalidInputError("discharge", "is out of range for this section (the result overflows)");
    this.depth[i] = depth;
    this.energy[i] = energy;
    this.friction[i] = friction;
    this.area[i] = sample.area;
    this.topWidth[i] = sample.topWidth;
    this.energyCoefficient[i] = sample.energyCoefficient;
  }
  /** Node i as a reported point, derived from its stored properties exactly as profilePointAt derives them. */
  point(i, bedLevel) {
    const depth = this.depth[i];
    const area = this.area[i];
    const velocity = this.discharge / area;
    const froude = velocity * Math.sqrt(this.energyCoefficient[i] * this.topWidth[i] / (GRAVITY * area));
    if (!Number.isFinite(velocity) || !Number.isFinite(froude)) throw new InvalidInputError("discharge", "is out of range for this section (the result overflows)");
    return {
      distanceUpstream: this.distance[i],
      depth,
      waterLevel: bedLevel + depth,
      bedLevel,
      velocity,
      froude,
      frictionSlope: this.friction[i],
      // Energy level = bed level + specific energy y + αV²/2g (Chow, Open-Channel Hydraulics, 1959, §3-1 — from memory).
      energyLevel: bedLevel + this.energy[i]
    };
  }
};

// src/lib/hydraulics/profiles/direct-step-march.ts
function stepLength(table, bedSlope, down, up) {
  return (table.energy[down] - table.energy[up]) / (bedSlope - (table.friction[down] + table.friction[up]) / 2);
}
function passes(depth, limit, rising) {
  return rising ? depth >= limit : depth <= limit;
}
function directStepMarch(reach2, depths, limits) {
  const table = new MarchTable(reach2.section, reach2.discharge);
  const start = depths(0);
  table.evaluate(0, start);
  table.distance[0] = 0;
  let last = 0;
  const rising = depths(1) > start;
  for (let k = 1; k <= limits.maxSteps; k++) {
    let depth = depths(k);
    let stop = null;
    if (limits.endDepth !== null && passes(depth, limits.endDepth, rising)) [depth, stop] = [limits.endDepth, limits.endsBy];
    if (rising && depth >= reach2.section.maxDepth) [depth, stop] = [reach2.section.maxDepth, "section-overtopped"];
    if (depth === table.depth[last] && stop === null) continue;
    const next = last + 1;
    table.evaluate(next, depth);
    const length = stepLength(table, reach2.bedSlope, last, next);
    if (!(length > 0) || !Number.isFinite(length)) {
      throw new EngineError(`profile: the direct step from ${table.depth[last]} m to ${depth} m gave no forward distance`, "profile", "no-convergence");
    }
    const distance = table.distance[last] + length;
    if (distance >= reach2.reachLength) {
      landOnReachEnd(reach2, table, last, depth);
      return { table, stoppedBy: "reach-end", stepsTaken: k };
    }
    table.distance[next] = distance;
    table.count = next + 1;
    last = next;
    if (stop !== null) return { table, stoppedBy: stop, stepsTaken: k };
  }
  table.count = last + 1;
  return { table, stoppedBy: null, stepsTaken: limits.maxSteps };
}
function landOnReachEnd(reach2, table, from, stepDepth) {
  const slot = from + 1;
  const fromDepth = table.depth[from];
  const remaining = reach2.reachLength - table.distance[from];
  let depth = fromDepth;
  if (remaining > 0) {
    const shortfall = (y) => {
      if (y === fromDepth) return -remaining;
      table.evaluate(slot, y);
      return stepLength(table, reach2.bedSlope, from, slot) - remaining;
    };
    const [lo, hi] = fromDepth < stepDepth ? [fromDepth, stepDepth] : [stepDepth, fromDepth];
    depth = brentRoot(shortfall, lo, hi, { tolerance: 1e-12 * hi, field: "profile" });
  }
  table.evaluate(slot, depth);
  table.distance[slot] = reach2.reachLength;
  table.count = slot + 1;
}
function marchPoints(reach2, march) {
  const { table } = march;
  const points = new Array(table.count);
  for (let i = 0; i < table.count; i++) points[i] = table.point(i, reach2.bedLevelAtControl + reach2.bedSlope * table.distance[i]);
  return points;
}

// src/lib/hydraulics/profiles/march-halving.ts
function depthAtDistance(run, x) {
  let lo = 0;
  let hi = run.count - 1;
  while (hi - lo > 1) {
    const mid = lo + hi >> 1;
    if (run.distance[mid] <= x) lo = mid;
    else hi = mid;
  }
  const span = run.distance[hi] - run.distance[lo];
  if (!(span > 0)) return run.depth[hi];
  const t = (x - run.distance[lo]) / span;
  return run.depth[lo] + (run.depth[hi] - run.depth[lo]) * t;
}
function nodeHalvingChange(coarse, fine) {
  const coarseExtent = coarse.count === 0 ? 0 : coarse.distance[coarse.count - 1];
  const fineExtent = fine.count === 0 ? 0 : fine.distance[fine.count - 1];
  const scale = Math.max(coarseExtent, fineExtent);
  const extentChange = scale > 0 ? Math.abs(fineExtent - coarseExtent) / scale : 0;
  const common = Math.min(coarseExtent, fineExtent);
  let levelChange = 0;
  for (let i = 0; i < coarse.count && coarse.distance[i] <= common; i++) {
    levelChange = Math.max(levelChange, Math.abs(coarse.depth[i] - depthAtDistance(fine, coarse.distance[i])));
  }
  return { extentChange, levelChange };
}
function coarseFromFine(march, steps, bedSlope, reachLength) {
  const { table } = march;
  const endedAtEndDepth = march.stoppedBy === "normal-depth" || march.stoppedBy === "hydraulic-jump";
  if (!endedAtEndDepth || steps % 2 !== 0 || march.stepsTaken !== steps || table.count !== steps + 1) return null;
  const half = steps / 2;
  const depth = [table.depth[0]];
  const distance = [0];
  for (let k = 1; k <= half; k++) {
    const [down, up] = [2 * k - 2, 2 * k];
    const length = (table.energy[down] - table.energy[up]) / (bedSlope - (table.friction[down] + table.friction[up]) / 2);
    if (!(length > 0) || !Number.isFinite(length)) return null;
    const at = distance[k - 1] + length;
    if (at >= reachLength) return null;
    distance.push(at);
    depth.push(table.depth[up]);
  }
  return { depth, distance, count: half + 1 };
}

// src/lib/hydraulics/profiles/march-refinement.ts
var ORDER = 2;
var AIM = 0.5;
var MOST_GROWTH = 16;
function nextResolution(steps, change, extentTolerance, levelTolerance) {
  const excess = Math.max(change.extentChange / extentTolerance, change.levelChange / levelTolerance);
  const wanted = Number.isFinite(excess) ? steps * Math.pow(excess / AIM, 1 / ORDER) : steps * 2;
  const bounded = Math.min(Math.max(wanted, 1.5 * steps), MOST_GROWTH * steps);
  return 2 * Math.ceil(bounded / 2);
}
function convergedMarch(compute, opts) {
  const maxResolution = opts.maxResolution ?? 2 ** 14;
  const extentTolerance = opts.extentTolerance ?? 1e-3;
  const levelTolerance = opts.levelTolerance ?? 1e-3;
  let steps = Math.max(2, Math.min(2 * (opts.initialResolution ?? 16), maxResolution));
  for (; ; ) {
    const march = compute(steps);
    const coarse = coarseFromFine(march, steps, opts.bedSlope, opts.reachLength) ?? compute(Math.max(1, Math.round(steps / 2))).table;
    const change = nodeHalvingChange(coarse, march.table);
    const refined = march.table.count > coarse.count;
    if (refined && change.extentChange < extentTolerance && change.levelChange < levelTolerance) return { march, change, converged: true, warning: null };
    if (steps >= maxResolution) {
      const warning = `the profile did not settle within ${maxResolution} steps: on the last halving the extent changed by ${(change.extentChange * 100).toFixed(3)} % and levels by ${Number.isFinite(change.levelChange) ? (change.levelChange * 1e3).toFixed(1) : "\u2014"} mm`;
      return { march, change, converged: false, warning };
    }
    steps = Math.min(refined ? nextResolution(steps, change, extentTolerance, levelTolerance) : 2 * steps, maxResolution);
  }
}
function fixedResolutionMarch(compute, steps, opts = {}) {
  const march = compute(steps);
  const change = nodeHalvingChange(march.table, compute(2 * steps).table);
  const converged = change.extentChange < (opts.extentTolerance ?? 1e-3) && change.levelChange < (opts.levelTolerance ?? 1e-3);
  return { march, change, converged, warning: null };
}

// src/lib/hydraulics/profiles/odex-solver.ts
import { createRequire } from "node:module";
var Solver = createRequire(import.meta.url)("odex").Solver;

// src/lib/hydraulics/profiles/ode-self-check.ts
var SELF_CHECK_METHOD = "odex (Gragg\u2013Bulirsch\u2013Stoer extrapolation) on dx/dy = \u2212(1 \u2212 Fr\xB2)/(S\u2080 \u2212 Sf), x upstream";
var MAX_SOLVER_STEPS = 2e3;
function distancePerDepth(section2, discharge, bedSlope, depth) {
  const froude = froudeNumber(section2, depth, discharge);
  return -(1 - froude * froude) / (bedSlope - frictionSlope(section2, depth, discharge));
}
function integratedDistances(f, depths) {
  const solver = new Solver(1);
  solver.denseOutput = true;
  solver.relativeTolerance = 1e-11;
  solver.absoluteTolerance = 1e-9;
  solver.maxSteps = MAX_SOLVER_STEPS;
  const rising = depths[depths.length - 1] > depths[0];
  const distances = [0];
  const result = solver.solve((y) => [f(y)], depths[0], [0], depths[depths.length - 1], (_n, yOld, y, x, dense) => {
    while (distances.length < depths.length && (rising ? depths[distances.length] <= y : depths[distances.length] >= y)) {
      const at = depths[distances.length];
      distances.push(dense !== void 0 && at !== y && at !== yOld ? dense(0, at) : x[0]);
    }
  });
  if (result.outcome !== 0 || distances.length !== depths.length || !distances.every(Number.isFinite)) return null;
  return distances;
}
function hermiteDistance(depths, distances, slopes, j) {
  const [y0, y1, x0, x1] = [depths[j], depths[j + 1], distances[j], distances[j + 1]];
  const h = y1 - y0;
  return (y) => {
    const t = (y - y0) / h;
    const t2 = t * t;
    const t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * x0 + (t3 - 2 * t2 + t) * h * slopes[j] + (-2 * t3 + 3 * t2) * x1 + (t3 - t2) * h * slopes[j + 1];
  };
}
function depthsAtDistances(depths, distances, slopes, targets) {
  const last = depths.length - 1;
  let j = 0;
  return targets.map((distance) => {
    if (distance >= distances[last]) return depths[last] + (distance - distances[last]) / slopes[last];
    while (j < last - 1 && distances[j + 1] < distance) j++;
    if (depths[j + 1] === depths[j] || !(distances[j] <= distance)) return depths[j];
    const curve = hermiteDistance(depths, distances, slopes, j);
    const [lo, hi] = depths[j] < depths[j + 1] ? [depths[j], depths[j + 1]] : [depths[j + 1], depths[j]];
    return brentRoot((y) => curve(y) - distance, lo, hi, { tolerance: 1e-13 * hi, field: "selfCheck" });
  });
}
function odeSelfCheck(input2) {
  const { section: section2, discharge, bedSlope, points } = input2;
  if (points.length < 2) return { report: { method: SELF_CHECK_METHOD, maxLevelDifference: 0, extentDifference: 0 }, warnings: [] };
  const f = (y) => distancePerDepth(section2, discharge, bedSlope, y);
  const depths = points.map((p2) => p2.depth);
  const distances = integratedDistances(f, depths);
  if (distances === null) return { report: null, warnings: ["the independent odex integration did not finish, so the profile has no self-check"] };
  const slopes = depths.map(f);
  const integratedDepths = depthsAtDistances(depths, distances, slopes, points.map((p2) => p2.distanceUpstream));
  const maxLevelDifference = points.reduce((max, p2, i) => Math.max(max, Math.abs(integratedDepths[i] - p2.depth)), 0);
  const extent = points[points.length - 1].distanceUpstream;
  const extentDifference = extent > 0 ? Math.abs(distances[distances.length - 1] - extent) / extent : 0;
  return { report: { method: SELF_CHECK_METHOD, maxLevelDifference, extentDifference }, warnings: [] };
}

// src/lib/hydraulics/profiles/point-state.ts
function profilePointAt(section2, discharge, depth, distanceUpstream, bedLevel) {
  const waterLevel = bedLevel + depth;
  return {
    distanceUpstream,
    depth,
    waterLevel,
    bedLevel,
    velocity: flowVelocity(section2, depth, discharge),
    froude: froudeNumber(section2, depth, discharge),
    frictionSlope: frictionSlope(section2, depth, discharge),
    // Energy level = bed level + specific energy y + αV²/2g (Chow, Open-Channel Hydraulics, 1959, §3-1 — from memory).
    energyLevel: bedLevel + specificEnergy(section2, depth, discharge)
  };
}

// src/lib/hydraulics/profiles/profile-type.ts
function profileType(slopeClass, depth, normalDepth2, criticalDepth2) {
  if (!(depth > 0) || !Number.isFinite(depth)) throw new InvalidInputError("depth", "must be a finite depth above 0");
  if (!(criticalDepth2 > 0) || !Number.isFinite(criticalDepth2)) throw new InvalidInputError("criticalDepth", "must be a finite depth above 0");
  const subcritical = depth >= criticalDepth2;
  switch (slopeClass) {
    case "horizontal":
      return subcritical ? "H2" : "H3";
    case "adverse":
      return subcritical ? "A2" : "A3";
    case "critical":
      return subcritical ? "C1" : "C3";
    case "mild":
      if (depth >= requiredNormalDepth(normalDepth2, slopeClass)) return "M1";
      return subcritical ? "M2" : "M3";
    case "steep":
      if (subcritical) return "S1";
      return depth >= requiredNormalDepth(normalDepth2, slopeClass) ? "S2" : "S3";
  }
}
function requiredNormalDepth(normalDepth2, slopeClass) {
  if (normalDepth2 === null || !(normalDepth2 > 0) || !Number.isFinite(normalDepth2)) {
    throw new InvalidInputError("normalDepth", `a ${slopeClass} bed needs a finite normal depth above 0`);
  }
  return normalDepth2;
}

// src/lib/hydraulics/profiles/profile-regime.ts
var CRITICAL_MATCH = 1e-6;
function controlBelowCritical(control, critical, slopeClass) {
  const after = slopeClass === "steep" ? "a control below critical depth cannot raise the water on a steep reach: the flow upstream stays at its supercritical normal depth" : "a downstream control cannot hold the water below critical depth; check the control level and the datum";
  return new NoPhysicalSolutionError("control", "control-below-critical", `the control depth ${control.toFixed(3)} m is below the critical depth ${critical.toFixed(3)} m: ${after}`);
}
function backwaterRegime(section2, discharge, bedSlope, controlDepth2, normalDepthTolerance) {
  requirePositive(discharge, "discharge");
  requireFinite(bedSlope, "reach.bedSlope");
  requirePositive(controlDepth2, "control.depth");
  if (controlDepth2 > section2.maxDepth) {
    throw new NoPhysicalSolutionError("control", "section-overtopped", `the control depth ${controlDepth2.toFixed(3)} m is above the top of the section (${section2.maxDepth.toFixed(3)} m deep)`);
  }
  const yc = criticalDepth(section2, discharge);
  const yn2 = bedSlope > 0 ? normalDepth(section2, discharge, bedSlope) : null;
  const slopeClass = classifySlope(bedSlope, yn2, yc);
  if (controlDepth2 < yc * (1 - CRITICAL_MATCH)) throw controlBelowCritical(controlDepth2, yc, slopeClass);
  const control = Math.max(controlDepth2, yc);
  const type = profileType(slopeClass, control, yn2, yc);
  const base = { slopeClass, profileType: type, criticalDepth: yc, normalDepth: yn2, controlDepth: control };
  if (yn2 === null) return { ...base, endDepth: null, endsBy: null, zeroLength: false };
  if (type === "S1") {
    const jumpDepth = sequentDepth(section2, yn2, discharge);
    return { ...base, endDepth: jumpDepth, endsBy: "hydraulic-jump", zeroLength: control <= jumpDepth };
  }
  const endDepth = control >= yn2 ? yn2 * (1 + normalDepthTolerance) : yn2 * (1 - normalDepthTolerance);
  const zeroLength = control >= yn2 ? control <= endDepth : control >= endDepth;
  return { ...base, endDepth, endsBy: "normal-depth", zeroLength };
}

// src/lib/hydraulics/profiles/hydraulic-jump.ts
function jumpReport(regime, jumpDistance) {
  if (jumpDistance === null || regime.endsBy !== "hydraulic-jump" || regime.normalDepth === null || regime.endDepth === null) return { jump: null, warnings: [] };
  const jump = { distanceUpstream: jumpDistance, upstreamDepth: regime.normalDepth, downstreamDepth: regime.endDepth };
  const where = jumpDistance === 0 ? `the control depth ${regime.controlDepth.toFixed(3)} m does not exceed the depth sequent to normal flow (${regime.endDepth.toFixed(3)} m), so the jump forms at the control` : `a hydraulic jump forms ${jumpDistance.toFixed(1)} m upstream of the control`;
  return { jump, warnings: [`${where}; upstream of it the flow is supercritical at normal depth ${regime.normalDepth.toFixed(3)} m and unaffected by the scheme`] };
}

// src/lib/hydraulics/profiles/direct-step.ts
var MAX_WIDENINGS = 60;
function runOnce(reach2, regime, steps) {
  const control = regime.controlDepth;
  const limits = { endDepth: regime.endDepth, endsBy: regime.endsBy, maxSteps: steps };
  const sequence = (towards) => regime.normalDepth === null ? proportionalDepths(control, towards, steps) : geometricDepths(control, towards, regime.normalDepth, steps);
  let march = null;
  if (regime.endDepth !== null) march = directStepMarch(reach2, sequence(regime.endDepth), limits);
  else {
    const deepest = Math.min(reach2.section.maxDepth, DEEPEST_OPEN_DEPTH);
    let upper = Math.min(2 * control, deepest);
    for (let i = 0; i < MAX_WIDENINGS && (march === null || march.stoppedBy === null); i++) {
      march = directStepMarch(reach2, sequence(upper), limits);
      if (upper >= deepest) break;
      upper = Math.min(upper * upper / control, deepest);
    }
  }
  if (march === null || march.stoppedBy === null) throw new EngineError("profile: the depth range never reached the end of the reach", "profile", "no-convergence");
  if (march.stoppedBy !== "reach-end" || march.stepsTaken >= steps) return march;
  const depthAtEnd = march.table.depth[march.table.count - 1];
  const refined = directStepMarch(reach2, sequence(depthAtEnd), { ...limits, maxSteps: 4 * steps + 16 });
  return refined.stoppedBy === null ? march : refined;
}
function asRun(reach2, regime, march) {
  const points = marchPoints(reach2, march);
  const { jump, warnings } = jumpReport(regime, march.stoppedBy === "hydraulic-jump" ? points[points.length - 1].distanceUpstream : null);
  if (march.stoppedBy === "section-overtopped") warnings.push("the water reaches the top of the section before the profile ends; the profile stops there");
  return { points, stoppedBy: march.stoppedBy ?? "reach-end", profileType: regime.profileType, jump, warnings };
}
function validated(input2) {
  requirePositive(input2.reachLength, "reach.length");
  requireFinite(input2.bedLevelAtControl, "reach.bedLevel");
  const tolerance = input2.normalDepthTolerance ?? 0.01;
  requirePositive(tolerance, "normalDepthTolerance");
  if (tolerance >= 0.5) throw new InvalidInputError("normalDepthTolerance", "must be below 0.5 (it is a fraction of the normal depth)");
  if (input2.depthSteps !== void 0 && !(Number.isInteger(input2.depthSteps) && input2.depthSteps >= 1 && input2.depthSteps <= 2 ** 20)) {
    throw new InvalidInputError("depthSteps", "must be a whole number from 1 to 2\xB2\u2070");
  }
  return tolerance;
}
function directStepProfile(input2) {
  const tolerance = validated(input2);
  const reach2 = input2;
  const regime = backwaterRegime(input2.section, input2.discharge, input2.bedSlope, input2.controlDepth, tolerance);
  if (regime.zeroLength) {
    const control = profilePointAt(input2.section, input2.discharge, regime.controlDepth, 0, input2.bedLevelAtControl);
    const { jump, warnings: warnings2 } = jumpReport(regime, regime.endsBy === "hydraulic-jump" ? 0 : null);
    return { points: [control], stoppedBy: regime.endsBy ?? "reach-end", profileType: regime.profileType, jump, refinement: { stepsUsed: 0, extentChangeOnHalving: 0, converged: true }, selfCheck: null, warnings: warnings2 };
  }
  const compute = (steps) => runOnce(reach2, regime, Math.max(1, Math.round(steps)));
  const refined = input2.depthSteps === void 0 ? convergedMarch(compute, { ...input2.refinement, bedSlope: input2.bedSlope, reachLength: input2.reachLength }) : fixedResolutionMarch(compute, input2.depthSteps, input2.refinement);
  const run = asRun(reach2, regime, refined.march);
  if (refined.warning !== null) run.warnings.push(refined.warning);
  const refinement = { stepsUsed: run.points.length - 1, extentChangeOnHalving: refined.change.extentChange, converged: refined.converged };
  const selfCheck = input2.skipSelfCheck ? null : odeSelfCheck({ section: input2.section, discharge: input2.discharge, bedSlope: input2.bedSlope, points: run.points });
  const warnings = [...run.warnings, ...selfCheck?.warnings ?? []];
  return { ...run, refinement, selfCheck: selfCheck?.report ?? null, warnings };
}

// src/lib/hydraulics/design/crest-sizing.ts
var MAX_GRID_STEPS = 2 ** 40;

// .speed-parts.ts
var section = prismaticSection({ shape: "trapezoidal", bottomWidth: 10, sideSlope: 2 }, 0.035);
function time(label, f) {
  for (let i = 0; i < 2e3; i++) f();
  const t = performance.now();
  let n = 0;
  while (performance.now() - t < 500) {
    f();
    n++;
  }
  const us = (performance.now() - t) / n * 1e3;
  console.log(label, us.toFixed(2), "\xB5s");
  return us;
}
var yn = normalDepth(section, 38, 6e-4);
var G = 9.80665;
function floor(steps) {
  const b = 10, z = 2, n = 0.035, Q = 38, S0 = 6e-4, y0 = 2.95, yEnd = yn * 1.01;
  const k = 2 * Math.sqrt(1 + z * z);
  const ratio = Math.pow((yEnd - yn) / (y0 - yn), 1 / steps);
  let y = y0, A = b * y + z * y * y, P = b + k * y, V = Q / A;
  let E = y + V * V / (2 * G);
  let K = A * Math.pow(A / P, 2 / 3) / n;
  let Sf = (Q / K) ** 2;
  let x = 0;
  let d = y0 - yn;
  for (let i = 1; i <= steps; i++) {
    d *= ratio;
    const y2 = yn + d;
    const A2 = b * y2 + z * y2 * y2, P2 = b + k * y2, V2 = Q / A2;
    const E2 = y2 + V2 * V2 / (2 * G);
    const K2 = A2 * Math.pow(A2 / P2, 2 / 3) / n;
    const Sf2 = (Q / K2) ** 2;
    x += (E - E2) / (S0 - (Sf + Sf2) / 2);
    E = E2;
    Sf = Sf2;
  }
  return x;
}
console.log(floor(48), floor(1 << 16));
var reach = { section, discharge: 38, bedSlope: 6e-4, bedLevelAtControl: 31.2, reachLength: 12e3 };
var f48 = time("floor48", () => floor(48));
var m = time("march48", () => directStepMarch(reach, geometricDepths(2.95, yn * 1.01, yn, 48), { endDepth: yn * 1.01, endsBy: "normal-depth", maxSteps: 48 }));
var input = { section, discharge: 38, bedSlope: 6e-4, controlDepth: 2.95, bedLevelAtControl: 31.2, reachLength: 12e3, normalDepthTolerance: 0.01, skipSelfCheck: true };
var p = time("profile", () => directStepProfile(input));
console.log("ratio", p / f48, m / f48);

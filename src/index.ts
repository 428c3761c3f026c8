/**
 * rxtherm — reaction thermochemistry for process, combustion and process-safety engineers.
 *
 * Every public name is listed here by name (no `export *`). Each module section is kept by
 * the team that owns that folder; add one reviewed line per new public symbol.
 *
 * @module
 */

// ── errors and units (layer 0) ───────────────────────────────────────────────
export { RxthermError, ERROR_CODES, isRxthermError } from "./errors.js";
export type { RxthermErrorCode, RxthermErrorDetails } from "./errors.js";
export {
  toKelvin, fromKelvin, toPascal, toJoule, toMol,
  STANDARD_TEMPERATURE_K, STANDARD_PRESSURE_PA, ATMOSPHERE_PA, GAS_CONSTANT_J_PER_MOL_K,
} from "./units.js";
export type { TemperatureUnit, PressureUnit, EnergyUnit, AmountUnit } from "./units.js";
export { fromPascal, fromJoule, toWatt, fromWatt, toMolPerSecond, fromMolPerSecond, fromJoulePerMol } from "./units.js";
export type { FlowUnit, PowerUnit, SpecificEnergyUnit, FlowQuantity, MolarMassOption } from "./units.js";
export { CELSIUS_SLIP_BELOW_K, celsiusSlipHint } from "./units.js";

// ── numeric (layer 0) ─────────────────────────────────────────────────────────
// (numeric section)
export {
  rational, rationalFrom, rationalFromInteger, rationalFromDecimalString, rationalFromNumber,
  rationalAdd, rationalSub, rationalMul, rationalDiv, rationalNeg, rationalCompare, rationalIsZero,
  rationalToNumber, rationalToString, gcdBigInt, lcmBigInt, scaleToCoprimeIntegers, divideByGcd,
} from "./numeric/rational.js";
export type { Rational, RationalLike } from "./numeric/rational.js";
export { reducedRowEchelon, matrixRank, nullSpace, integerNullSpace, solveLinearSystem } from "./numeric/linearAlgebra.js";
export type { MatrixLike, RowEchelonResult, LinearSolution } from "./numeric/linearAlgebra.js";
export { findRoot } from "./numeric/roots.js";
export { jsonReplacer } from "./numeric/jsonReplacer.js";
export type { FindRootOptions, RootResult } from "./numeric/roots.js";

// ── formula (layer 1) ─────────────────────────────────────────────────────────
export type { Formula, Phase } from "./formula/types.js";
// (formula section)
export { parseFormula, FORMULA_LIMITS } from "./formula/parseFormula.js";
export { safeParseFormula } from "./formula/safeParseFormula.js";
export type { SafeParseFormulaResult } from "./formula/safeParseFormula.js";
export { formatFormula } from "./formula/formatFormula.js";
export type { FormatFormulaOptions } from "./formula/formatFormula.js";
export { molarMass, ELECTRON_MOLAR_MASS_G_PER_MOL } from "./formula/molarMass.js";
export type { MolarMassOptions } from "./formula/molarMass.js";
export { elementMassFractions } from "./formula/elementMassFractions.js";
export { ATOMIC_WEIGHTS, HYDROGEN_ISOTOPES, ATOMIC_WEIGHTS_EDITION, elementData } from "./formula/atomicWeights.js";
export type { ElementData, AtomicWeightKind } from "./formula/atomicWeights.js";

// ── reaction (layer 2) ────────────────────────────────────────────────────────
export type { Reaction, Term } from "./reaction/types.js";
// (reaction section)
export { parseReaction, MAX_REACTION_LENGTH, MAX_REACTION_COEFFICIENT } from "./reaction/parseReaction.js";
export { balanceReaction } from "./reaction/balanceReaction.js";
export type { BalanceInput, BalanceReactionOptions } from "./reaction/balanceReaction.js";
export { checkBalance } from "./reaction/checkBalance.js";
export type { BalanceCheck } from "./reaction/checkBalance.js";
export { independentReactions } from "./reaction/independentReactions.js";
export { formatReaction } from "./reaction/formatReaction.js";
export type { FormatReactionOptions } from "./reaction/formatReaction.js";
export { scaleReaction, reverseReaction } from "./reaction/scaleReaction.js";

// ── extent and combustion (layer 3) ──────────────────────────────────────────
export type { Flows, Stream, ExtentSpec } from "./extent/types.js";
// (extent section)
export { solveExtents } from "./extent/solveExtents.js";
export type { SolveExtentsInput, SolveExtentsOptions, SolveExtentsResult } from "./extent/solveExtents.js";
export { limitingReactant } from "./extent/limitingReactant.js";
export type { LimitingReactantResult } from "./extent/limitingReactant.js";
export { reconcileExtents } from "./extent/reconcileExtents.js";
export type { ReconcileExtentsInput, ReconcileExtentsOptions, ReconcileExtentsResult } from "./extent/reconcileExtents.js";
export { massToMolarFlows, molarToMassFlows, moleFractions, massFractions, totalFlow, totalMassFlow } from "./extent/streams.js";
export type { MassFlowOptions } from "./extent/streams.js";
export { combustion, DRY_AIR, AIR_21_79 } from "./extent/combustion.js";
export type { CombustionInput, CombustionResult, UltimateAnalysis, UltimateFuel, AirHumidity } from "./extent/combustion.js";
export { excessAirFromFlueO2, excessAirFromFlueCO2 } from "./extent/excessAirFromFlueO2.js";
export type { ExcessAirFromFlueO2Input, ExcessAirFromFlueCO2Input } from "./extent/excessAirFromFlueO2.js";
export { waterSaturationPressure, waterSaturationTemperature } from "./extent/waterSaturationPressure.js";
export { MAX_EXCESS_AIR, EQUIVALENCE_RATIO_LIMITS, checkMixtureLimits } from "./extent/mixtureLimits.js";
export type { FormulaLookup } from "./extent/types.js";

// ── heat capacity (layer 3) ───────────────────────────────────────────────────
// (heat-capacity section)
export type {
  CpForm, ShomateForm, PolynomialForm, Nasa7Form, Nasa9Form, ConstantCpForm, TabulatedCpForm, CpRange, RangeOptions,
} from "./heat-capacity/types.js";
export { createHeatCapacity, MAX_CP_TABLE_POINTS, MAX_CP_RANGES } from "./heat-capacity/createHeatCapacity.js";
export type { HeatCapacity, HeatCapacityValue, CreateHeatCapacityOptions } from "./heat-capacity/createHeatCapacity.js";
export { boundaryJumps } from "./heat-capacity/boundaryJumps.js";
export type { BoundaryJump } from "./heat-capacity/boundaryJumps.js";
export { fitCp } from "./heat-capacity/fitCp.js";
export type { CpPoint, FitCpFormName, FitCpOptions, FitCpResult } from "./heat-capacity/fitCp.js";

// ── species and library (layer 4) ─────────────────────────────────────────────
// (species section)
export type {
  Species, Library, LibraryGetOptions, SpeciesEvaluation, SpeciesTransition,
} from "./species/types.js";
export { species } from "./species/species.js";
export { noteExtrapolation } from "./species/noteExtrapolation.js";
export type { ExtrapolatedPoint } from "./species/noteExtrapolation.js";
export { findSpecies } from "./species/findSpecies.js";
export type { SpeciesQuery } from "./species/findSpecies.js";
export { createLibrary } from "./species/createLibrary.js";
export type { CreateLibraryOptions } from "./species/createLibrary.js";
export { builtInLibrary } from "./species/builtInLibrary.js";
export {
  validateSpeciesData, MAX_SPECIES_PER_DATA, MAX_ABS_HF298_KJ_PER_MOL, MAX_CP_J_PER_MOL_K, MAX_S298_J_PER_MOL_K, MAX_LOWEST_TMIN_K,
} from "./species/validateSpeciesData.js";
export type { SpeciesDataIssue, ValidateSpeciesDataOptions } from "./species/validateSpeciesData.js";
export {
  speciesDataSchema, speciesEntrySchema, cpFormSchema, cpRangeSchema, transitionSchema, unitsBlockSchema, speciesDataJsonSchema,
} from "./species/schema.js";
export type { SpeciesData, SpeciesDataInput, SpeciesEntry, SpeciesEntryInput } from "./species/schema.js";
export { SOURCES, citation } from "./species/citation.js";

// ── enthalpy (layer 5) ────────────────────────────────────────────────────────
// (enthalpy section)
export { reactionEnthalpy } from "./enthalpy/reactionEnthalpy.js";
export type { ReactionEnthalpyOptions, ReactionEnthalpyResult, ReactionEnthalpyTerm } from "./enthalpy/reactionEnthalpy.js";
export { reactionEntropy } from "./enthalpy/reactionEntropy.js";
export type { ReactionEntropyOptions } from "./enthalpy/reactionEntropy.js";
export { reactionGibbs } from "./enthalpy/reactionGibbs.js";
export type { ReactionGibbsOptions } from "./enthalpy/reactionGibbs.js";
export { equilibriumConstant } from "./enthalpy/equilibriumConstant.js";
export type { EquilibriumConstantOptions } from "./enthalpy/equilibriumConstant.js";
export { hessCombine } from "./enthalpy/hessCombine.js";
export type { HessCombination, KnownReactionEnthalpy } from "./enthalpy/hessCombine.js";
export { reactionEnthalpyFromCombustion, COMBUSTION_REFERENCE_SPECIES } from "./enthalpy/reactionEnthalpyFromCombustion.js";
export type { CombustionEnthalpyResult } from "./enthalpy/reactionEnthalpyFromCombustion.js";
export { formationEnthalpyFromCombustion } from "./enthalpy/formationEnthalpyFromCombustion.js";
export type { FormationEnthalpyFromCombustionOptions } from "./enthalpy/formationEnthalpyFromCombustion.js";
export { heatingValue, NORMAL_MOLAR_VOLUME_M3_PER_MOL } from "./enthalpy/heatingValue.js";
export type { HeatingValueOptions } from "./enthalpy/heatingValue.js";
export { wobbeIndex, AIR_MOLAR_MASS_G_PER_MOL } from "./enthalpy/wobbeIndex.js";
export type { WobbeIndexOptions } from "./enthalpy/wobbeIndex.js";

// ── energy balances (layer 6) ─────────────────────────────────────────────────
// (energy section)
export { heatDuty } from "./energy/heatDuty.js";
export type { HeatDutyInput, HeatDutyOptions, HeatDutyResult, StreamHeat, PhaseChange } from "./energy/heatDuty.js";
export { adiabaticReactionTemperature, adiabaticTemperatureRise } from "./energy/adiabaticReactionTemperature.js";
export { availableHeat } from "./energy/availableHeat.js";
export type { AvailableHeatInput, AvailableHeatResult, FiredLosses, UnburnedCarbon } from "./energy/availableHeat.js";
export { efficiencyCurve } from "./energy/efficiencyCurve.js";
export type { EfficiencySweep, EfficiencyCurveResult } from "./energy/efficiencyCurve.js";
export { flueGasDewPoint, DEFAULT_SO3_FRACTION } from "./energy/flueGasDewPoint.js";
export type { FlueGasDewPointInput, FlueGasDewPointResult } from "./energy/flueGasDewPoint.js";
export type {
  AdiabaticReactionInput, AdiabaticReactionOptions, AdiabaticReactionResult, AdiabaticTemperatureRiseResult,
} from "./energy/adiabaticReactionTemperature.js";

// ── flame (layer 6) ───────────────────────────────────────────────────────────
// (flame section)
export { equilibriumComposition } from "./flame/equilibriumComposition.js";
export type { EquilibriumInput, EquilibriumOptions, EquilibriumResult } from "./flame/equilibriumComposition.js";
export { adiabaticFlameTemperature } from "./flame/adiabaticFlameTemperature.js";
export type { AdiabaticFlameInput, AdiabaticFlameOptions, AdiabaticFlameResult } from "./flame/adiabaticFlameTemperature.js";
export { flameTemperatureSweep, MAX_SWEEP_POINTS } from "./flame/flameTemperatureSweep.js";
export type { FlameSweep, FlameSweepResult } from "./flame/flameTemperatureSweep.js";
export { DEFAULT_FLAME_PRODUCTS, SULFUR_FLAME_PRODUCTS } from "./flame/flameDefaults.js";

// ── display (layer 7; the display symbols and view types live in view/, layer 0) ──
// (display section)
export { JUPYTER_DISPLAY, RESULT_VIEW } from "./view/displaySymbols.js";
export type { ResultView, ViewTable, ViewColumn, ViewCell, MimeBundle } from "./view/types.js";
export { show } from "./display/show.js";
export { mimeBundle } from "./display/mimeBundle.js";
export { toText } from "./display/toText.js";
export { toMarkdown } from "./display/toMarkdown.js";
export { toHtml } from "./display/toHtml.js";
export type { Displayable, ChartSpec, ChartChannel, SpeciesChartOptions } from "./display/types.js";
export { cpChart, MAX_CHART_POINTS, MAX_CHART_SERIES } from "./display/cpChart.js";
export type { CpChartOptions } from "./display/cpChart.js";
export { enthalpyChart } from "./display/enthalpyChart.js";
export type { EnthalpyChartOptions } from "./display/enthalpyChart.js";
export { flameChart } from "./display/flameChart.js";
export { efficiencyChart } from "./display/efficiencyChart.js";
export { compositionChart } from "./display/compositionChart.js";
export type { CompositionChartOptions } from "./display/compositionChart.js";
export { dutyChart } from "./display/dutyChart.js";

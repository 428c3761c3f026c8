// What a new user of the installed package does first, run by every consumer of the packed tarball
// (Node ESM, Node CommonJS, Deno with a local install and with the npm: specifier). Throws on a failure.

/**
 * @param {Record<string, any>} api the package's exports as the consumer loaded them
 * @param {string} label who loaded them, for the messages
 */
export function check(api, label) {
  const fail = (what) => { throw new Error(`${label}: ${what}`); };
  // IUPAC standard atomic weights (abridged): 2 × 1.008 + 15.999 = 18.015 g/mol
  const m = api.molarMass("H2O");
  if (Math.abs(m - 18.015) > 1e-9) fail(`molarMass("H2O") = ${m}`);
  // common practice: propane burns as C3H8 + 5 O2 -> 3 CO2 + 4 H2O
  const text = api.formatReaction(api.balanceReaction("C3H8 + O2 -> CO2 + H2O"));
  if (text !== "C3H8 + 5 O2 -> 3 CO2 + 4 H2O") fail(`balanceReaction gave ${text}`);
  // NIST-JANAF 4th ed. 1998, CO2(g): H(1000 K) − H(298.15 K) = 33.397 kJ/mol (from memory of the table)
  const co2 = api.species("CO2(g)");
  const dH = (co2.enthalpy(1000) - co2.hf298) / 1000;
  if (Math.abs(dH - 33.397) > 0.05) fail(`CO2 H(1000) − H(298.15) = ${dH} kJ/mol`);
  // stoichiometric methane–air at 298.15 K and 1 atm, equilibrium products: about 2226 K (from memory)
  const T = api.adiabaticFlameTemperature({ fuel: "CH4(g)", equivalenceRatio: 1 }).T;
  if (Math.abs(T - 2226) > 15) fail(`flame temperature ${T} K`);
  // user data are validated with zod (loaded on first use)
  try {
    api.createLibrary({ sources: {}, species: [{ key: "X(g)" }] });
    fail("createLibrary accepted an entry without data");
  } catch (e) {
    if (e?.code !== "INVALID_DATA") throw e;
  }
  return `${label}: ok (molar mass ${m.toFixed(3)} g/mol, ${text}, flame ${T.toFixed(0)} K)`;
}

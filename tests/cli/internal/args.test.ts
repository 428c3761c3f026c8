import { describe, expect, it } from "vitest";
import { flag, optionValue, parseArgs, positionals } from "../../../src/cli/internal/args.js";
import { UsageError } from "../../../src/cli/internal/usage.js";

const SPECS = [{ name: "T", value: "TEMP", help: "" }, { name: "json", help: "" }, { name: "help", help: "" }];

describe("parseArgs(command, argv, specs)", () => {
  it("reads positionals, --name value, --name=value and flags", () => {
    const a = parseArgs("x", ["CH4", "--T", "25C", "--json", "N2"], SPECS);
    expect(a.positionals).toEqual(["CH4", "N2"]);
    expect(optionValue(a, "T")).toBe("25C");
    expect(flag(a, "json")).toBe(true);
    expect(optionValue(parseArgs("x", ["--T=-40C"], SPECS), "T")).toBe("-40C");
  });
  it("takes a value that starts with a minus sign, and negative numbers as positionals", () => {
    expect(optionValue(parseArgs("x", ["--T", "-40C"], SPECS), "T")).toBe("-40C");
    expect(parseArgs("x", ["-5", "-.5"], SPECS).positionals).toEqual(["-5", "-.5"]);
  });
  it("-h is --help, and -- ends the options", () => {
    expect(flag(parseArgs("x", ["-h"], SPECS), "help")).toBe(true);
    expect(parseArgs("x", ["--", "--json"], SPECS).positionals).toEqual(["--json"]);
  });
  it("refuses unknown, repeated and valueless options with a usage error naming them", () => {
    expect(() => parseArgs("flame", ["--excess", "15%"], SPECS)).toThrow(/unknown option --excess \(see rxtherm flame --help\)/);
    expect(() => parseArgs("x", ["--json", "--json"], SPECS)).toThrow(/given twice/);
    expect(() => parseArgs("x", ["--T"], SPECS)).toThrow(/needs a value TEMP/);
    expect(() => parseArgs("x", ["--json=yes"], SPECS)).toThrow(/takes no value/);
    expect(() => parseArgs("x", ["--nope"], SPECS)).toThrow(UsageError);
  });
  it("positionals(command, args, names) requires exactly the named arguments", () => {
    expect(positionals("x", parseArgs("x", ["a"], SPECS), ["A"])).toEqual(["a"]);
    expect(() => positionals("mass", parseArgs("x", [], SPECS), ["FORMULA"])).toThrow(/missing FORMULA/);
    expect(() => positionals("x", parseArgs("x", ["a", "b"], SPECS), ["A"])).toThrow(/unexpected argument "b"/);
  });
});

import { describe, expect, it } from "vitest";
import { CsvProblem, guessMapping, parseLoggerCsv, readingsFromTable } from "@/lib/bench/csv";

const problem = (fn: () => unknown): CsvProblem => {
  try {
    fn();
  } catch (e) {
    if (e instanceof CsvProblem) return e;
    throw e;
  }
  throw new Error("no problem raised");
};

describe("logger CSV import", () => {
  it("reads units from the headers: minutes and °F", () => {
    const t = parseLoggerCsv("Elapsed (min),Sink °F,Probe\n0,77,heatsink\n2,95,heatsink\n4,107.6,heatsink\n");
    const m = guessMapping(t);
    expect(m).toEqual({ time: 0, temperature: 1, place: 2 });
    const r = readingsFromTable(t, m);
    expect(r.map((x) => x.tS)).toEqual([0, 120, 240]);
    expect(r[0]!.tempC).toBeCloseTo(25, 9);
    expect(r[2]!.tempC).toBeCloseTo(42, 9);
    expect(r[1]!.place).toBe("heatsink");
  });

  it("clock times count from the first row; semicolons and decimal commas", () => {
    const t = parseLoggerCsv("time;temp\n12:00:00;24,8\n12:01:30;31,2\n12:03:00;36,0\n");
    const r = readingsFromTable(t, guessMapping(t));
    expect(r.map((x) => x.tS)).toEqual([0, 90, 180]);
    expect(r[1]!.tempC).toBeCloseTo(31.2, 9);
  });

  it("pasted lines without a header are seconds and °C", () => {
    const t = parseLoggerCsv("0, 24.8\n120, 33.1\n240, 39.6");
    const r = readingsFromTable(t, guessMapping(t));
    expect(r).toEqual([{ tS: 0, tempC: 24.8 }, { tS: 120, tempC: 33.1 }, { tS: 240, tempC: 39.6 }]);
  });

  it("a unit chosen by the maker wins over the header", () => {
    const t = parseLoggerCsv("t,T\n0,300\n60,310\n");
    const r = readingsFromTable(t, { time: 0, temperature: 1 }, { time: "min", temperature: "K" });
    expect(r[1]!.tS).toBe(3600);
    expect(r[1]!.tempC).toBeCloseTo(36.85, 9);
  });

  it("a CSV with no numeric column", () => {
    expect(problem(() => parseLoggerCsv("name,place\nsink,bench\nboard,bench\n")).message).toBe("No column of the file holds numbers, so there are no readings to take from it.");
  });

  it("a column mapped twice", () => {
    const t = parseLoggerCsv("time,temp\n0,25\n60,30\n");
    expect(problem(() => readingsFromTable(t, { time: 1, temperature: 1 })).message).toBe("Column “temp” is mapped twice; give time and temperature a column each.");
  });

  it("100,000 rows or more", () => {
    const rows = Array.from({ length: 100_000 }, (_, i) => `${i},${25 + i / 1e4}`).join("\n");
    const e = problem(() => parseLoggerCsv(`time,temp\n${rows}`));
    expect(e.message).toMatch(/^The file has 100,000 rows; a run takes at most 99,999\./);
  });

  it("a blank cell names its row in the file", () => {
    const t = parseLoggerCsv("time,temp,note\n0,25,a\n60,,b\n120,31,c\n");
    expect(problem(() => readingsFromTable(t, { time: 0, temperature: 1 })).message).toBe("Row 3: the temperature cell is blank or does not read as a number.");
  });
});

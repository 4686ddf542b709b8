import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { neutralizeCell, toCsv } from "~/lib/csv";

describe("CSV cells a spreadsheet would run as formulas (OWASP CSV injection guidance)", () => {
  it.each(['=HYPERLINK("http://x","click")', "+1+1", "-2+3", "@SUM(A1)", "\tlead", "\rlead"])("neutralizes %j", (cell) => {
    expect(neutralizeCell(cell)).toBe(`'${cell}`);
  });

  it("leaves plain text and numbers as they are", () => {
    expect(neutralizeCell("Pump loses prime")).toBe("Pump loses prime");
    expect(neutralizeCell(-5)).toBe(-5);
    expect(neutralizeCell("")).toBe("");
  });

  it("writes a guide titled as a formula as text, still escaped for commas and quotes", () => {
    const text = toCsv([['=HYPERLINK("http://evil.example","x")', 'He said "hi", then left']], ["guide", "note"]);
    const [row] = parse(text, { columns: true }) as Record<string, string>[];
    expect(row.guide).toBe('\'=HYPERLINK("http://evil.example","x")');
    expect(row.note).toBe('He said "hi", then left');
  });
});

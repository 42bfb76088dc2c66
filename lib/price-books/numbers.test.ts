import { describe, expect, it } from "vitest";
import { formatMoney, percentText, readDecimal, readPercent } from "./numbers";

const money = (v: number | string) => readDecimal(v, { label: "Price", max: 100_000, decimals: 2, dollars: true });

describe("numbers as people type them", () => {
  it.each([
    ["14.20", 14.2],
    ["$14.2", 14.2],
    ["$ 1,234.50", 1234.5],
    [".5", 0.5],
    ["0", 0],
    [21, 21],
    [0.1 + 0.2, 0.1 + 0.2], // float noise under a cent is still cents
  ])("reads the price %j", (input, value) => {
    expect(money(input)).toEqual({ ok: true, value });
  });

  it.each([
    ["", "Price is required."],
    ["-3", "Price must be zero or more."],
    ["1,5", "Price: write a number such as 14.20."],
    ["12.345", "Price must be in dollars and cents (at most 2 decimals)."],
    [12.345, "Price must be in dollars and cents (at most 2 decimals)."],
    ["100001", "Price must be at most $100,000.00."],
    [Number.NaN, "Price must be a number."],
  ])("refuses the price %j", (input, message) => {
    expect(money(input)).toEqual({ ok: false, message });
  });

  it.each([
    ["8.25", 0.0825],
    ["8.25 %", 0.0825],
    ["15%", 0.15],
    [".5", 0.005],
    ["0", 0],
  ])("reads the percentage %j as a fraction", (text, fraction) => {
    expect(readPercent(text, "Tax rate", 100)).toEqual({ ok: true, value: fraction });
  });

  it.each([
    [0.0825, "8.25"],
    [0.15, "15"],
    [0.07, "7"],
    [0.29, "29"], // 0.29 × 100 is 28.999999999999996 in floating point
  ])("writes %d as the percentage %s", (fraction, text) => {
    expect(percentText(fraction)).toBe(text);
  });

  it("writes money in dollars and cents", () => {
    expect(formatMoney(1234.5)).toBe("$1,234.50");
  });
});

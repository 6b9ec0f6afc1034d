// Numbers in messages: six significant digits, no trailing zeros ("2650", "40.004", "0.333333").
export const fmt = (v: number): string => Number(v.toPrecision(6)).toString();

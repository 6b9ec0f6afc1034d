// Runs tests/reference/rolling_reference.py with Debian's /usr/bin/python3 (python3-scipy,
// python3-mpmath). When python or its libraries are missing this throws, so the tests that need
// it fail with the reason instead of skipping.

import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";

export const PYTHON = "/usr/bin/python3";
const SCRIPT = fileURLToPath(new URL("../../reference/rolling_reference.py", import.meta.url));

export function pythonReference<T = Record<string, number>>(cases: object[]): T[] {
  let out: string;
  try {
    out = execFileSync(PYTHON, [SCRIPT], {
      input: JSON.stringify({ cases }),
      encoding: "utf8",
      timeout: 120_000,
      maxBuffer: 1 << 24,
    });
  } catch (e) {
    const err = e as { stderr?: string; message: string };
    throw new Error(
      `The reference computation needs ${PYTHON} with python3-scipy and python3-mpmath ` +
        `(apt-get install python3-scipy python3-mpmath). It failed: ${err.stderr || err.message}`,
    );
  }
  return (JSON.parse(out) as { results: T[] }).results;
}

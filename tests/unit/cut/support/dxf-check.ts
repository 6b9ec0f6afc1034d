// Runs tests/reference/dxf_check.py (ezdxf strict read + audit) with Debian's /usr/bin/python3,
// which has python3-ezdxf 0.18.1; the pyenv python3 on PATH cannot import it. When python or ezdxf
// is missing this throws, so the test fails with the reason instead of skipping.
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";

export const PYTHON = "/usr/bin/python3";
const SCRIPT = fileURLToPath(new URL("../../../reference/dxf_check.py", import.meta.url));

export interface EzEntity {
  type: string;
  layer: string;
  handle: string;
  closed?: boolean;
  points?: Array<[number, number, number]>;
  area?: number;
  center?: [number, number];
  radius?: number;
  start?: [number, number];
  end?: [number, number];
  text?: string;
  insert?: [number, number];
  height?: number;
}

export interface EzFile {
  path: string;
  dxfversion: string;
  insunits: number;
  audit_errors: string[];
  audit_fixes: number;
  layers: string[];
  entities: EzEntity[];
}

export function ezdxfCheck(paths: string[]): EzFile[] {
  try {
    const out = execFileSync(PYTHON, [SCRIPT, ...paths], { encoding: "utf8", timeout: 60_000, maxBuffer: 1 << 28 });
    return (JSON.parse(out) as { files: EzFile[] }).files;
  } catch (e) {
    const err = e as { stderr?: string; message: string };
    throw new Error(
      `The DXF check needs ${PYTHON} with python3-ezdxf (apt-get install python3-ezdxf). It failed: ${err.stderr || err.message}`,
    );
  }
}

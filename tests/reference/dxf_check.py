#!/usr/bin/python3
"""Independent reading of Axlewright's DXF files with ezdxf (Debian python3-ezdxf 0.18.1): a strict
ezdxf.readfile, then doc.audit(). Prints one JSON object per file with the header's $INSUNITS, the
LAYER table's names and every modelspace entity: type, layer, closed flag, vertices (x, y, bulge)
and area for polylines (arcs from bulges flattened by ezdxf.path), centre and radius for circles,
end points for lines, content, insertion point and height for text. The test (tests/unit/cut/dxf.test.ts) makes its assertions on this output.
Usage: /usr/bin/python3 dxf_check.py FILE.dxf [FILE.dxf ...]"""
import json
import sys

import ezdxf
from ezdxf import math as emath
from ezdxf import path as epath


def polyline_area(e):
    pts = list(e.get_points("xyb"))
    if any(abs(b) > 0 for _, _, b in pts):
        flat = list(epath.make_path(e).flattening(0.0001))
        return abs(emath.area([(p.x, p.y) for p in flat]))
    return abs(emath.area([(x, y) for x, y, _ in pts]))


def entity(e):
    t = e.dxftype()
    out = {"type": t, "layer": e.dxf.layer, "handle": e.dxf.handle}
    if t == "LWPOLYLINE":
        out["closed"] = bool(e.closed)
        out["points"] = [[x, y, b] for x, y, b in e.get_points("xyb")]
        out["area"] = polyline_area(e)
    elif t == "POLYLINE":
        out["closed"] = bool(e.is_closed)
        out["points"] = [[v.dxf.location.x, v.dxf.location.y, v.dxf.bulge] for v in e.vertices]
    elif t == "CIRCLE":
        c = e.dxf.center
        out["center"] = [c.x, c.y]
        out["radius"] = e.dxf.radius
    elif t == "LINE":
        out["start"] = [e.dxf.start.x, e.dxf.start.y]
        out["end"] = [e.dxf.end.x, e.dxf.end.y]
    elif t == "TEXT":
        out["text"] = e.dxf.text
        out["insert"] = [e.dxf.insert.x, e.dxf.insert.y]
        out["height"] = e.dxf.height
    return out


def check(path):
    doc = ezdxf.readfile(path)
    auditor = doc.audit()
    return {
        "path": path,
        "dxfversion": doc.dxfversion,
        "insunits": doc.header.get("$INSUNITS"),
        "audit_errors": [str(err.message) for err in auditor.errors],
        "audit_fixes": len(auditor.fixes),
        "layers": [layer.dxf.name for layer in doc.layers],
        "entities": [entity(e) for e in doc.modelspace()],
    }


if __name__ == "__main__":
    json.dump({"files": [check(p) for p in sys.argv[1:]]}, sys.stdout)

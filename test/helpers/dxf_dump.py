"""Read a DXF with ezdxf (Debian python3-ezdxf), run its audit, print JSON.

Usage: /usr/bin/python3 dxf_dump.py file.dxf
Output: {"version", "insunits", "errors", "fixes", "layers": [...],
         "entities": [{"type", "layer", "closed", "points": [[x, y, bulge]], "z": [...],
                       "center", "radius"}]}
"""
import json
import sys

import ezdxf
from ezdxf import recover

doc, auditor = recover.readfile(sys.argv[1])
auditor2 = doc.audit()
out = {
    "version": doc.dxfversion,
    "insunits": doc.header.get("$INSUNITS"),
    "errors": [str(e.message) for e in auditor.errors] + [str(e.message) for e in auditor2.errors],
    "fixes": [str(e.message) for e in auditor.fixes] + [str(e.message) for e in auditor2.fixes],
    "layers": sorted(layer.dxf.name for layer in doc.layers),
    "entities": [],
}
for e in doc.modelspace():
    rec = {"type": e.dxftype(), "layer": e.dxf.layer}
    if e.dxftype() == "LWPOLYLINE":
        rec["closed"] = bool(e.closed)
        rec["points"] = [[p[0], p[1], p[4]] for p in e.get_points("xyseb")]
        rec["z"] = [e.dxf.elevation]
    elif e.dxftype() == "CIRCLE":
        rec["center"] = [e.dxf.center.x, e.dxf.center.y]
        rec["z"] = [e.dxf.center.z]
        rec["radius"] = e.dxf.radius
    elif e.dxftype() == "LINE":
        rec["points"] = [[e.dxf.start.x, e.dxf.start.y, 0], [e.dxf.end.x, e.dxf.end.y, 0]]
        rec["z"] = [e.dxf.start.z, e.dxf.end.z]
    out["entities"].append(rec)
json.dump(out, sys.stdout)

"""Read a DXF with ezdxf (Debian python3-ezdxf), run its audit, print JSON.

Usage: /usr/bin/python3 dxf_dump.py file.dxf
Output: {"version", "insunits", "measurement", "extmin", "extmax", "errors",
         "fixes", "layers": [...], "layerTable": [{"name", "color", "on", "plot"}],
         "comments": [...],
         "entities": [{"type", "layer", "closed", "points": [[x, y, bulge]], "z": [...],
                       "center", "radius", "text"}]}
LAYER colour sign (group 62: negative = off) and plot flag (group 290) per the
AutoCAD DXF Reference; R12 files have no group 290 (reported as 1).
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
    "measurement": doc.header.get("$MEASUREMENT"),
    "extmin": list(doc.header.get("$EXTMIN", (0, 0, 0)))[:2],
    "extmax": list(doc.header.get("$EXTMAX", (0, 0, 0)))[:2],
    "layers": sorted(layer.dxf.name for layer in doc.layers),
    "layerTable": [{"name": l.dxf.name, "color": l.dxf.color, "on": l.is_on(), "plot": int(l.dxf.get("plot", 1))} for l in doc.layers],
    "comments": [],
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
    elif e.dxftype() == "POLYLINE":
        rec["closed"] = bool(e.is_closed)
        rec["points"] = [[v.dxf.location.x, v.dxf.location.y, v.dxf.get("bulge", 0)] for v in e.vertices]
        rec["z"] = [v.dxf.location.z for v in e.vertices]
    elif e.dxftype() == "ARC":
        rec["center"] = [e.dxf.center.x, e.dxf.center.y]
        rec["z"] = [e.dxf.center.z]
        rec["radius"] = e.dxf.radius
    elif e.dxftype() == "TEXT":
        rec["text"] = e.dxf.text
        rec["z"] = [e.dxf.insert.z]
    elif e.dxftype() == "LINE":
        rec["points"] = [[e.dxf.start.x, e.dxf.start.y, 0], [e.dxf.end.x, e.dxf.end.y, 0]]
        rec["z"] = [e.dxf.start.z, e.dxf.end.z]
    out["entities"].append(rec)
with open(sys.argv[1], encoding="ascii", errors="replace") as f:
    lines = f.read().split("\n")
out["comments"] = [lines[i + 1] for i in range(0, len(lines) - 1, 2) if lines[i].strip() == "999"]
json.dump(out, sys.stdout)

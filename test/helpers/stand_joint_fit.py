"""Check the tab-and-slot joints of a parts DXF with ezdxf and shapely
(Debian python3-ezdxf and python3-shapely, run with /usr/bin/python3).

Usage: /usr/bin/python3 stand_joint_fit.py joints.json
joints.json: {"dxf": path, "joints": [{"r0": [x, y], "r1": [x, y], "out": [ux, uy],
  "slotCentre": [x, y], "slotAxis": [ax, ay], "tabThickness": t}]}, all in the DXF's
coordinates. For each joint: the tab as cut (the piece's CUT_PROFILE outline
clipped beyond its shoulder r0-r1), its length along the shoulder and its
depth; the slot as cut (the smallest closed CUT_PROFILE outline around the
slot centre); the tab's cross-section through the slot (its length by the
tab part's thickness, centred on the slot) tested for containment, and the
least gap between it and the slot's edge.
Prints JSON {"audit": [errors], "joints": [{"tabLength", "tabDepth", "inside", "gap"}]}.
"""
import json
import sys

from ezdxf import recover
from shapely.geometry import Point, Polygon
from shapely import affinity

spec = json.load(open(sys.argv[1]))
doc, auditor = recover.readfile(spec["dxf"])
audit2 = doc.audit()
polys = []
for e in doc.modelspace():
    if e.dxf.layer == "CUT_PROFILE" and e.dxftype() == "LWPOLYLINE" and e.closed:
        pts = [(p[0], p[1]) for p in e.get_points("xy")]
        poly = Polygon(pts)
        if not poly.is_valid:
            raise SystemExit("invalid CUT_PROFILE polygon near %r" % (pts[0],))
        polys.append(poly)

out = []
for j in spec["joints"]:
    r0, r1, u = j["r0"], j["r1"], j["out"]
    inside_pt = Point(r0[0] - u[0] * 0.5 + (r1[0] - r0[0]) * 0.5, r0[1] - u[1] * 0.5 + (r1[1] - r0[1]) * 0.5)
    piece = max((p for p in polys if p.contains(inside_pt)), key=lambda p: p.area)
    far = 1000.0
    box = Polygon([tuple(r0), (r0[0] + u[0] * far, r0[1] + u[1] * far), (r1[0] + u[0] * far, r1[1] + u[1] * far), tuple(r1)])
    tab = piece.intersection(box)
    if tab.geom_type != "Polygon":  # the shared sides come back as lines beside the polygon
        tab = max((g for g in getattr(tab, "geoms", []) if g.geom_type == "Polygon"), key=lambda g: g.area)
    # extents along the shoulder and along the tab's direction
    ax = ((r1[0] - r0[0]), (r1[1] - r0[1]))
    n = (ax[0] ** 2 + ax[1] ** 2) ** 0.5
    ax = (ax[0] / n, ax[1] / n)
    pts = list(tab.exterior.coords)
    along = [(x - r0[0]) * ax[0] + (y - r0[1]) * ax[1] for x, y in pts]
    deep = [(x - r0[0]) * u[0] + (y - r0[1]) * u[1] for x, y in pts]
    length = max(along) - min(along)
    depth = max(deep) - min(deep)
    c = Point(j["slotCentre"])
    slot = min((p for p in polys if p.contains(c)), key=lambda p: p.area)
    t = j["tabThickness"]
    a = j["slotAxis"]
    section = Polygon([(-length / 2, -t / 2), (length / 2, -t / 2), (length / 2, t / 2), (-length / 2, t / 2)])
    import math
    section = affinity.rotate(section, math.degrees(math.atan2(a[1], a[0])), origin=(0, 0))
    section = affinity.translate(section, c.x, c.y)
    out.append({
        "tabLength": length,
        "tabDepth": depth,
        "inside": bool(slot.contains(section)),
        "gap": slot.exterior.distance(section),
        "slotArea": slot.area,
    })

print(json.dumps({"audit": [str(x.message) for x in auditor.errors] + [str(x.message) for x in audit2.errors], "joints": out}))

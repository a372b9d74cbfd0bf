"""Check etch outlines against the strokes they stand for, with shapely
(Debian python3-shapely 1.8).

Usage: /usr/bin/python3 etch_check.py input.json
input: {"strokes": [{"points": [[x, y], ...], "closed": bool, "widthMm": w,
         "caps": "butt"|"round"}], "regions": [{"outer": [[x, y], ...],
         "holes": [[[x, y], ...], ...]}]}
Prints JSON: every region's validity, the largest overlap area between two
regions, the outlines' area, the area of the union of the strokes (each
buffered by width/2 with shapely: flat caps for "butt", round caps for
"round", round joins, 64 segments per quarter circle) and that union's
number of connected regions.
"""
import json
import sys

from shapely.geometry import LineString, Point, Polygon
from shapely.ops import unary_union
from shapely.strtree import STRtree

data = json.load(open(sys.argv[1]))
polys = [Polygon(r["outer"], r["holes"]) for r in data["regions"]]
invalid = [i for i, p in enumerate(polys) if not p.is_valid]
tree = STRtree(polys)
index = {id(p): i for i, p in enumerate(polys)}
max_overlap = 0.0
for i, p in enumerate(polys):
    for q in tree.query(p):
        j = index[id(q)]
        if j <= i:
            continue
        max_overlap = max(max_overlap, p.intersection(q).area)
shapes = []
for s in data["strokes"]:
    pts = s["points"]
    r = s["widthMm"] / 2
    cap = 1 if s["caps"] == "round" else 2
    if len(pts) == 1 or (len(pts) == 2 and pts[0] == pts[1]):
        shapes.append(Point(pts[0]).buffer(r, resolution=64))
        continue
    if s["closed"]:
        pts = pts + [pts[0]]
    shapes.append(LineString(pts).buffer(r, resolution=64, cap_style=cap, join_style=1))
union = unary_union(shapes)
regions = len(union.geoms) if hasattr(union, "geoms") else 1
print(json.dumps({
    "regions": len(polys),
    "invalid": invalid,
    "maxOverlapMm2": max_overlap,
    "outlineAreaMm2": sum(p.area for p in polys),
    "strokeUnionAreaMm2": union.area,
    "strokeUnionRegions": regions,
}))

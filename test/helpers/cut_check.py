"""Geometry checks of a router cutting program's tool paths with shapely
(Debian python3-shapely, run with /usr/bin/python3).

stdin: JSON {"parts": [{"name", "outer": [[x, y], ...], "inner": [[[x, y], ...] | {"cx", "cy", "r"}]}],
             "runs": [[[x, y, z], ...], ...], "finalZ": z}
stdout: JSON, per run: {"part": name or null, "side": "inside" | "outside",
  "distMin", "distMax": distance from the run's final-depth points to the nearest
  nominal edge of that part, "area": signed area of the final-depth points (> 0
  counter-clockwise)}.
"""
import json
import sys

from shapely.geometry import LineString, Point, Polygon

data = json.load(sys.stdin)
final_z = data["finalZ"]
parts = []
for p in data["parts"]:
    outer = Polygon(p["outer"])
    edges = [outer.exterior]
    holes = []
    for f in p["inner"]:
        if isinstance(f, dict):
            c = Point(f["cx"], f["cy"]).buffer(f["r"], 2048)
        else:
            c = Polygon(f)
        holes.append(c)
        edges.append(c.exterior)
    parts.append((p["name"], outer, holes, edges))

out = []
for run in data["runs"]:
    xy = [(q[0], q[1]) for q in run]
    deep = [(q[0], q[1]) for q in run if abs(q[2] - final_z) < 1e-4]
    probe = deep or xy
    mid = Point(sum(q[0] for q in probe) / len(probe), sum(q[1] for q in probe) / len(probe))
    owner = None
    side = "outside"
    for name, outer, holes, edges in parts:
        inside_hole = any(h.buffer(1e-6).contains(Point(q)) for h in holes for q in probe[:1])
        if inside_hole:
            owner, side = name, "inside"
            break
    if owner is None:
        # The outer profile of the part whose outline is nearest.
        best = min(parts, key=lambda p: p[1].exterior.distance(mid))
        owner = best[0]
    name, outer, holes, edges = next(p for p in parts if p[0] == owner)
    pool = edges if side == "outside" else [h.exterior for h in holes]
    dists = [min(e.distance(Point(q)) for e in pool) for q in deep]
    inside_part = [outer.contains(Point(q)) and not any(h.contains(Point(q)) for h in holes) for q in deep]
    area = 0.0
    for i in range(len(deep)):
        x0, y0 = deep[i]
        x1, y1 = deep[(i + 1) % len(deep)]
        area += x0 * y1 - x1 * y0
    out.append({
        "part": owner,
        "side": side,
        "distMin": min(dists) if dists else None,
        "distMax": max(dists) if dists else None,
        "inPart": sum(inside_part),
        "area": area / 2,
        "points": len(deep),
    })
json.dump(out, sys.stdout)

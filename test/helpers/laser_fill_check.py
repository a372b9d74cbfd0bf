"""Area check of a laser fill with shapely (Debian python3-shapely, run with
/usr/bin/python3): the area the beam sweeps (every burn polyline buffered by
half the beam width, round ends) against the area of the drawn lines (every
stroke buffered by half its width: flat ends for marks and curves, round for
text; less the holes and slots the beam must not cross).

stdin: JSON {"beam": mm, "burns": [[[x, y], ...], ...],
             "strokes": [{"points": [[x, y], ...], "closed": bool, "width": mm, "round": bool}],
             "holes": [{"cx", "cy", "r"}], "slots": [{"x0", "y0", "x1", "y1"}],
             "png": optional path, "zoom": optional [x0, x1, y0, y1]}
stdout: JSON {"swept", "drawn", "sweptNotDrawn", "drawnNotSwept"} in mm².
"""
import json
import sys

from shapely.geometry import LineString, Point, Polygon, box
from shapely.ops import unary_union

d = json.load(sys.stdin)
half = d["beam"] / 2
RES = 16  # segments per quarter circle


def line(points, closed):
    pts = [tuple(p) for p in points]
    if closed:
        pts = pts + [pts[0]]
    if len(pts) == 1:
        return Point(pts[0])
    return LineString(pts)


swept = unary_union([line(b, False).buffer(half, RES) for b in d["burns"] if len(b) > 0])
drawn = unary_union([
    line(s["points"], s["closed"]).buffer(s["width"] / 2, RES, cap_style=1 if s["round"] or s["closed"] else 2, join_style=1)
    for s in d["strokes"]
])
cuts = [Point(h["cx"], h["cy"]).buffer(h["r"], 256) for h in d["holes"]] + [box(s["x0"], s["y0"], s["x1"], s["y1"]) for s in d["slots"]]
if cuts:
    drawn = drawn.difference(unary_union(cuts))
out = {
    "swept": swept.area,
    "drawn": drawn.area,
    "sweptNotDrawn": swept.difference(drawn).area,
    "drawnNotSwept": drawn.difference(swept).area,
}
if d.get("png"):
    import matplotlib
    matplotlib.use("Agg")
    import matplotlib.pyplot as plt

    fig, ax = plt.subplots(figsize=(12, 8), dpi=120)

    def draw(geom, **kw):
        geoms = getattr(geom, "geoms", [geom])
        for g in geoms:
            if g.is_empty:
                continue
            x, y = g.exterior.xy
            ax.fill(x, y, **kw)
            for hole in g.interiors:
                hx, hy = hole.xy
                ax.fill(hx, hy, color="white")

    draw(drawn, color="#cccccc")
    draw(swept, color="#d06010", alpha=0.55)
    for b in d["burns"]:
        if len(b) > 1:
            xs, ys = zip(*b)
            ax.plot(xs, ys, color="black", linewidth=0.3)
    ax.set_aspect("equal")
    if d.get("zoom"):
        z = d["zoom"]
        ax.set_xlim(z[0], z[1])
        ax.set_ylim(z[2], z[3])
    ax.set_title("grey: drawn lines; orange: burned at the beam width; black: beam centre")
    fig.savefig(d["png"], bbox_inches="tight")
json.dump(out, sys.stdout)

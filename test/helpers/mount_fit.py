"""Shapely checks of a wall mount (test/wallMount.test.ts): argv[1] is a JSON file
{mount: [[x, y], ...], plate: [x0, y0, x1, y1], anchors: [[x, y, d], ...], washerMm: D}.
Prints JSON: whether the dial plate's footprint lies inside the mount, the least gap
between an anchor's washer and the plate's footprint, and between a washer and the mount's edge."""
import json
import sys

from shapely.geometry import Point, Polygon, box

job = json.load(open(sys.argv[1]))
mount = Polygon(job["mount"])
plate = box(*job["plate"])
washers = [Point(x, y).buffer(job["washerMm"] / 2, 64) for x, y, _ in job["anchors"]]
print(json.dumps({
    "mountValid": mount.is_valid,
    "plateInside": mount.contains(plate),
    "washerToPlateMm": min(w.distance(plate) for w in washers),
    "washerToEdgeMm": min(mount.exterior.distance(w) for w in washers),
    "washersInside": all(mount.contains(w) for w in washers),
}))

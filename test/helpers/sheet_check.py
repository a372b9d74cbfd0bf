"""Check a sheet layout DXF with ezdxf and shapely (Debian python3-ezdxf,
python3-shapely 1.8).

Usage: /usr/bin/python3 sheet_check.py sheet.dxf width length
Reads every closed LWPOLYLINE and CIRCLE on CUT_PROFILE; the outer profiles
are the rings inside no other ring, each part's cut region its outer ring
minus the rings and circles inside it. Prints JSON: the number of parts, the
largest overlap area between two parts' regions, their smallest distance,
and how far any part reaches outside the sheet rectangle (0 = on the sheet).
"""
import json
import sys

import ezdxf
from shapely.geometry import box

from cut_rings import cut_rings

doc = ezdxf.readfile(sys.argv[1])
W = float(sys.argv[2])
L = float(sys.argv[3])
rings = cut_rings(doc, 32)
outers = [r for i, r in enumerate(rings) if not any(j != i and o.area > r.area and o.contains(r) for j, o in enumerate(rings))]
regions = []
for o in outers:
    region = o
    for r in rings:
        if r is not o and o.contains(r):
            region = region.difference(r)
    regions.append(region)
overlap = 0.0
distance = float("inf")
for i in range(len(regions)):
    for j in range(i + 1, len(regions)):
        overlap = max(overlap, regions[i].intersection(regions[j]).area)
        distance = min(distance, regions[i].distance(regions[j]))
sheet = box(0, 0, W, L)
outside = max((r.difference(sheet).area for r in regions), default=0.0)
print(json.dumps({
    "parts": len(regions),
    "valid": all(r.is_valid for r in regions),
    "maxOverlapMm2": overlap,
    "minDistanceMm": distance if distance != float("inf") else None,
    "outsideMm2": outside,
    "edgeMm": min((min(r.bounds[0], r.bounds[1], W - r.bounds[2], L - r.bounds[3]) for r in regions), default=None),
}))

"""Check router reliefs with shapely (Debian python3-shapely 1.8).

Usage: /usr/bin/python3 relief_check.py input.json
input: {"r": tool radius, "slots": [[[x, y], ...]], "tabs": [[[x, y], ...]],
        "fin": [[x, y], ...], "finNominal": [[x, y], ...]}
Prints JSON:
- tabOutside: for each slot, the area of its tab rectangle outside the region
  a round tool of radius r can reach inside the slot (the slot's opening,
  buffer(-r).buffer(+r));
- finLeft: the area a round tool of radius r cutting around the relieved fin
  leaves outside the nominal fin (its closing, buffer(+r).buffer(-r), minus
  the nominal fin), and the same for the unrelieved fin (finLeftNominal).
"""
import json
import sys

from shapely.geometry import Polygon

d = json.load(open(sys.argv[1]))
r = d["r"]
res = 64
out = {"tabOutside": [], "slotValid": []}
for slot, tab in zip(d["slots"], d["tabs"]):
    s = Polygon(slot)
    opening = s.buffer(-r, resolution=res).buffer(r, resolution=res)
    out["tabOutside"].append(Polygon(tab).difference(opening).area)
    out["slotValid"].append(s.is_valid)
if d.get("fin"):
    fin = Polygon(d["fin"])
    nominal = Polygon(d["finNominal"])
    out["finValid"] = fin.is_valid
    out["finLeft"] = fin.buffer(r, resolution=res, join_style=1).buffer(-r, resolution=res, join_style=1).difference(nominal).area
    out["finLeftNominal"] = nominal.buffer(r, resolution=res, join_style=1).buffer(-r, resolution=res, join_style=1).difference(nominal).area
print(json.dumps(out))

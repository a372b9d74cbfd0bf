"""Check the pieces of a parts DXF with ezdxf and shapely (Debian
python3-ezdxf and python3-shapely, run with /usr/bin/python3).

Usage: /usr/bin/python3 pieces_apart.py parts.dxf
The closed CUT_PROFILE polylines and circles are read; the outlines no other
outline contains are the pieces, every other one a cut-out. Prints JSON
{"audit": [errors], "pieces": n, "cutouts": n, "valid": bool, "leastGapMm": d,
"cutoutsInOnePiece": bool}: the least distance between two pieces (> 0
when none overlap or touch), and whether each cut-out lies inside exactly
one piece, clear of its edge.
"""
import json
import sys

from ezdxf import recover

from cut_rings import cut_rings

doc, auditor = recover.readfile(sys.argv[1])
audit2 = doc.audit()
rings = cut_rings(doc, 64)
valid = all(r.is_valid for r in rings)
pieces = [r for r in rings if not any(o is not r and o.contains(r) for o in rings)]
cutouts = [r for r in rings if not any(p is r for p in pieces)]
gap = min((a.distance(b) for i, a in enumerate(pieces) for b in pieces[i + 1:]), default=float("inf"))
inside = all(sum(1 for p in pieces if p.contains(c)) == 1 for c in cutouts)
print(json.dumps({
    "audit": [str(x.message) for x in auditor.errors] + [str(x.message) for x in audit2.errors],
    "pieces": len(pieces),
    "cutouts": len(cutouts),
    "valid": valid,
    "leastGapMm": gap,
    "cutoutsInOnePiece": inside,
}))

"""Audit every DXF in a folder with ezdxf (Debian python3-ezdxf) in one process.

Usage: /usr/bin/python3 dxf_audit_many.py folder
Prints JSON {file: {"errors": [...], "insunits": n, "entities": n, "nonzero_z": n}}.
"""
import json
import os
import sys

from ezdxf import recover

out = {}
folder = sys.argv[1]
for name in sorted(os.listdir(folder)):
    if not name.endswith(".dxf"):
        continue
    try:
        doc, auditor = recover.readfile(os.path.join(folder, name))
        audit2 = doc.audit()
        msp = doc.modelspace()
        nonzero = 0
        count = 0
        for e in msp:
            count += 1
            if e.dxftype() == "LWPOLYLINE" and e.dxf.elevation != 0:
                nonzero += 1
            if e.dxftype() == "CIRCLE" and e.dxf.center.z != 0:
                nonzero += 1
        out[name] = {
            "errors": [str(x.message) for x in auditor.errors] + [str(x.message) for x in audit2.errors],
            "insunits": doc.header.get("$INSUNITS"),
            "entities": count,
            "nonzero_z": nonzero,
        }
    except Exception as exc:  # report, never hide
        out[name] = {"errors": ["read failed: " + repr(exc)], "insunits": None, "entities": 0, "nonzero_z": 0}
json.dump(out, sys.stdout)

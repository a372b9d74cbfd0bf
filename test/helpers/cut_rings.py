"""The closed cut profiles of a DXF as shapely polygons (Debian
python3-ezdxf and python3-shapely, run with /usr/bin/python3): every closed
LWPOLYLINE and every CIRCLE (as a polygon of `resolution` segments a
quarter) on CUT_PROFILE, in drawing order. Shared by the helper scripts."""
from shapely.geometry import Point, Polygon


def cut_rings(doc, resolution):
    rings = []
    for e in doc.modelspace():
        if e.dxf.layer != "CUT_PROFILE":
            continue
        if e.dxftype() == "LWPOLYLINE" and e.closed:
            rings.append(Polygon([(p[0], p[1]) for p in e.get_points("xy")]))
        elif e.dxftype() == "CIRCLE":
            rings.append(Point(e.dxf.center[0], e.dxf.center[1]).buffer(e.dxf.radius, resolution))
    return rings

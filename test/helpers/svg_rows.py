"""Read a check.svg with the standard library's XML parser (it must be well-formed) and print, as JSON,
its size, every <rect> that carries a <title> (the worst-error rows: class, title, x, width) and every
<text> (class and content). Usage: /usr/bin/python3 svg_rows.py FILE.svg"""
import json
import sys
import xml.etree.ElementTree as ET

NS = '{http://www.w3.org/2000/svg}'
root = ET.parse(sys.argv[1]).getroot()
assert root.tag == NS + 'svg', root.tag
rows = []
for rect in root.iter(NS + 'rect'):
    title = rect.find(NS + 'title')
    if title is None:
        continue
    rows.append({'cls': rect.get('class'), 'title': title.text, 'x': float(rect.get('x')), 'width': float(rect.get('width'))})
texts = [{'cls': t.get('class'), 'text': t.text} for t in root.iter(NS + 'text')]
print(json.dumps({'width': float(root.get('width')), 'height': float(root.get('height')), 'rows': rows, 'texts': texts}))

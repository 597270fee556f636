#!/usr/bin/env python3
"""Measures a printed build sheet from outside: hole circles in an SVG (drawn by poppler's
pdftocairo from the PDF, or written directly), words and their boxes from poppler's pdftotext
-bbox, and checks them against the board.

Units: PDF user space is 1/72 in (ISO 32000-1); 1 in = 25.4 mm exactly. The SVG written by the
sheet itself uses millimetres as user units (width/height attributes in mm).

Prints one "PASS name" or "FAIL name: detail" line per check.
"""
import argparse
import html
import json
import re
import sys

MM_PER_PT = 25.4 / 72.0
TOLERANCE_MM = 0.05

PATH_RE = re.compile(r'<path\b([^>]*)/>')
ATTR_RE = re.compile(r'(\w[\w-]*)="([^"]*)"')
NUMBER_RE = re.compile(r'-?\d+(?:\.\d+)?(?:e-?\d+)?')
WORD_RE = re.compile(r'<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">'
                     r'(.*?)</word>')

results = []


def check(name, ok, detail=""):
    results.append((name, ok, detail))


def paths(svg_text):
    for match in PATH_RE.finditer(svg_text):
        yield dict(ATTR_RE.findall(match.group(1)))


def transformed(points, transform):
    if not transform:
        return points
    a, b, c, d, e, f = [float(v) for v in NUMBER_RE.findall(transform)]
    return [(a * x + c * y + e, b * x + d * y + f) for x, y in points]


def white_circles(svg_text, scale_to_mm):
    """Centres (mm) and diameters of filled white circles: the drawn holes."""
    found = []
    for attrs in paths(svg_text):
        style = attrs.get('style', '').replace(' ', '')
        if 'fill:rgb(100%,100%,100%)' not in style or 'stroke:none' not in style:
            continue
        d = attrs.get('d', '')
        if not d.startswith('M') or d.count('C') not in (2, 4) or re.search('[LHVZz]', d):
            continue
        # On-curve points only: the start and the end of each Bezier segment of the arc.
        numbers = [float(v) for v in NUMBER_RE.findall(d)]
        ends = [(numbers[0], numbers[1])]
        ends += [(numbers[i + 4], numbers[i + 5]) for i in range(2, len(numbers) - 5, 6)]
        points = transformed(ends[:-1], attrs.get('transform'))
        xs = [p[0] * scale_to_mm for p in points]
        ys = [p[1] * scale_to_mm for p in points]
        width = max(xs) - min(xs)
        if width < 0.2:
            continue
        found.append((sum(xs) / len(xs), sum(ys) / len(ys), width))
    return found


def hole_views(circles, pitch, rows, cols):
    """Groups hole circles into views: lists of rows (top to bottom), each sorted left to right.
    Only circles of the most common diameter count (the holes)."""
    diameters = {}
    for _, _, dia in circles:
        key = round(dia, 2)
        diameters[key] = diameters.get(key, 0) + 1
    hole_dia = max(diameters, key=diameters.get)
    holes = sorted((x, y) for x, y, dia in circles if abs(dia - hole_dia) < 0.02)
    lines = {}
    for x, y in holes:
        lines.setdefault(round(y / 0.05), []).append((x, y))
    segments = []
    for key in sorted(lines):
        line = sorted(lines[key])
        start = 0
        for i in range(1, len(line) + 1):
            if i == len(line) or line[i][0] - line[i - 1][0] > 1.5 * pitch:
                segments.append(line[start:i])
                start = i
    views = []
    for segment in segments:
        for view in views:
            last = view[-1]
            if (abs(last[0][0] - segment[0][0]) < 0.1 and len(last) == len(segment)
                    and abs(segment[0][1] - last[0][1] - pitch) < 0.1):
                view.append(segment)
                break
        else:
            views.append([segment])
    return [v for v in views if len(v) == rows and all(len(r) == cols for r in v)]


def words(bbox_text):
    out = []
    for m in WORD_RE.finditer(bbox_text):
        x0, y0, x1, y1 = (float(v) * MM_PER_PT for v in m.groups()[:4])
        out.append((html.unescape(m.group(5)), (x0 + x1) / 2, (y0 + y1) / 2, x0, x1, y0, y1))
    return out


def column_label(all_words, view, text):
    """The column-number word `text` printed in the band just above the view's top row."""
    top_y = view[0][0][1]
    left, right = view[0][0][0], view[0][-1][0]
    for word, cx, cy, *_ in all_words:
        if word == text and top_y - 4.5 < cy < top_y - 1.0 and left - 1.5 < cx < right + 1.5:
            return cx
    return None


def row_letter(all_words, view, text):
    row_y = view[0][0][1]
    left = min(view[0][0][0], view[0][-1][0])
    for word, cx, cy, *_ in all_words:
        if word == text and abs(cy - row_y) < 1.0 and left - 6.0 < cx < left:
            return cx
    return None


def measure_pdf(args):
    svg = open(args.svg, encoding='utf-8').read()
    bbox = open(args.bbox, encoding='utf-8').read()
    pitch, rows, cols, cuts = args.pitch, args.rows, args.cols, args.cuts
    views = hole_views(white_circles(svg, MM_PER_PT), pitch, rows, cols)
    check('two true-scale views of %dx%d holes on page 1' % (cols, rows), len(views) == 2,
          'found %d' % len(views))
    if len(views) != 2:
        return
    component, copper = views  # drawn in this order: component side first
    all_words = words(bbox)
    caption = [w for w in all_words if w[0] == 'COPPER']
    check('copper side captioned', bool(caption))
    check('caption says mirrored', 'MIRRORED:' in [w[0] for w in all_words])

    top = component[0]
    a1_a10 = top[9][0] - top[0][0]
    # 0.1 in = 2.54 mm exactly; nine pitches between hole centres A1 and A10.
    check('A1 to A10 is 9 x %.2f mm (holes)' % pitch, abs(a1_a10 - 9 * pitch) <= TOLERANCE_MM,
          '%.4f mm' % a1_a10)
    every = [r[i + 1][0] - r[i][0] for r in component + copper for i in range(len(r) - 1)]
    check('every hole pitch on paper is %.2f mm' % pitch,
          all(abs(g - pitch) <= TOLERANCE_MM for g in every),
          'min %.4f max %.4f' % (min(every), max(every)))
    label1, label10 = column_label(all_words, component, '1'), column_label(all_words, component, '10')
    check('component side: numbers 1 and 10 over A1 and A10',
          label1 is not None and label10 is not None
          and abs(label1 - top[0][0]) <= TOLERANCE_MM and abs(label10 - top[9][0]) <= TOLERANCE_MM,
          '%s %s' % (label1, label10))
    if label1 is not None and label10 is not None:
        check('A1 to A10 is 9 x %.2f mm (numbers)' % pitch,
              abs(label10 - label1 - 9 * pitch) <= TOLERANCE_MM, '%.4f mm' % (label10 - label1))

    ctop = copper[0]
    one, last = column_label(all_words, copper, '1'), column_label(all_words, copper, str(cols))
    check('copper side: hole 1 at the right-hand end of the top row',
          one is not None and abs(one - ctop[-1][0]) <= TOLERANCE_MM, 'label 1 at %s, row %.3f..%.3f'
          % (one, ctop[0][0], ctop[-1][0]))
    check('copper side: hole %d at the left-hand end' % cols,
          last is not None and abs(last - ctop[0][0]) <= TOLERANCE_MM)
    check('copper side: top row is strip A', row_letter(all_words, copper, 'A') is not None)

    red = sum(1 for attrs in paths(svg) if 'stroke:rgb(100%,0%,0%)' in attrs.get('style', ''))
    check('one cut mark per cut (%d)' % cuts, red == cuts, 'found %d' % red)
    left = ctop[0][0] - pitch / 2
    right = ctop[-1][0] + pitch / 2
    top_y, bottom_y = ctop[0][1] - pitch, copper[-1][0][1] + pitch / 2
    numbers = sorted(int(w[0]) for w in all_words if w[0].isdigit()
                     and left < w[1] < right + pitch and top_y < w[2] < bottom_y)
    check('cuts numbered 1..%d on the copper side' % cuts, numbers == list(range(1, cuts + 1)),
          str(numbers))
    check_calibration_bar(all_words)
    print('measured A1-A10: %.4f mm' % a1_a10)


def check_calibration_bar(all_words):
    """The 50 mm scale: its labels 0 and 50 must lie 50 mm apart on paper."""
    zeros = [w for w in all_words if w[0] == '0']
    for zero in zeros:
        fifty = [w for w in all_words if w[0] == '50' and abs(w[2] - zero[2]) < 0.3]
        if fifty:
            length = fifty[0][1] - zero[1]
            check('calibration bar labels 0 and 50 are 50 mm apart',
                  abs(length - 50.0) <= TOLERANCE_MM, '%.4f mm' % length)
            return
    check('calibration bar found', False)


def measure_pitch(args):
    """Any page: every run of holes is spaced one pitch; counts holes and cut marks."""
    svg = open(args.svg, encoding='utf-8').read()
    circles = white_circles(svg, MM_PER_PT)
    lines = {}
    for x, y, _ in circles:
        lines.setdefault(round(y / 0.05), []).append(x)
    gaps = []
    for xs in lines.values():
        xs.sort()
        gaps += [b - a for a, b in zip(xs, xs[1:]) if b - a < 1.5 * args.pitch]
    check('holes spaced %.2f mm' % args.pitch,
          bool(gaps) and all(abs(g - args.pitch) <= TOLERANCE_MM for g in gaps),
          'min %.4f max %.4f' % (min(gaps, default=0), max(gaps, default=0)))
    red = sum(1 for a in paths(svg) if 'stroke:rgb(100%,0%,0%)' in a.get('style', ''))
    print('hole circles %d cut marks %d' % (len(circles), red))


def measure_svg(args):
    svg = open(args.svg, encoding='utf-8').read()
    root = re.search(r'<svg\b[^>]*>', svg).group(0)
    attrs = dict(ATTR_RE.findall(root))
    check('SVG width in mm', attrs.get('width', '').endswith('mm'), attrs.get('width', ''))
    check('SVG height in mm', attrs.get('height', '').endswith('mm'), attrs.get('height', ''))
    width = float(attrs['width'][:-2])
    view_box = [float(v) for v in attrs.get('viewBox', '').split()]
    check('SVG width %.1f mm' % args.paper_width, abs(width - args.paper_width) < 0.01)
    check('SVG viewBox in mm', len(view_box) == 4 and abs(view_box[2] - width) < 1e-6)
    views = hole_views(white_circles(svg, 1.0), args.pitch, args.rows, args.cols)
    check('SVG: two views on page 1', len(views) >= 2, 'found %d' % len(views))
    if len(views) < 2:
        return
    top = views[0][0]
    check('SVG: A1 to A10 is 9 x %.2f mm' % args.pitch,
          abs(top[9][0] - top[0][0] - 9 * args.pitch) <= TOLERANCE_MM,
          '%.4f' % (top[9][0] - top[0][0]))
    red = sum(1 for a in paths(svg) if 'stroke:rgb(100%,0%,0%)' in a.get('style', ''))
    check('SVG: one cut mark per cut (%d)' % args.cuts, red == args.cuts, 'found %d' % red)
    if args.same_as:
        pdf_svg = open(args.same_as, encoding='utf-8').read()
        pdf_views = hole_views(white_circles(pdf_svg, MM_PER_PT), args.pitch, args.rows, args.cols)
        ok = len(pdf_views) >= 2 and all(
            abs(a[0] - b[0]) <= TOLERANCE_MM and abs(a[1] - b[1]) <= TOLERANCE_MM
            for va, vb in zip(views, pdf_views) for ra, rb in zip(va, vb) for a, b in zip(ra, rb))
        check('SVG holes where the PDF has them', ok)


def board_facts(path):
    """Rows, columns, pitch and number of cuts of a board file."""
    board = json.load(open(path, encoding='utf-8'))
    return {'rows': board['board']['rows'], 'cols': board['board']['cols'],
            'pitch': board['board'].get('pitch_mm', 2.54), 'cuts': len(board.get('cuts', []))}


def main():
    parser = argparse.ArgumentParser()
    sub = parser.add_subparsers(dest='mode', required=True)
    pitch = sub.add_parser('pitch')
    pitch.add_argument('svg')
    pitch.add_argument('--pitch', type=float, default=2.54)
    pdf = sub.add_parser('pdf')
    pdf.add_argument('svg')
    pdf.add_argument('bbox')
    svg = sub.add_parser('svg')
    svg.add_argument('svg')
    svg.add_argument('--paper-width', type=float, required=True)
    svg.add_argument('--same-as')
    for p in (pdf, svg):
        # The board's size, pitch and number of cuts: given one by one, or read from its file.
        p.add_argument('--board')
        p.add_argument('--rows', type=int)
        p.add_argument('--cols', type=int)
        p.add_argument('--pitch', type=float)
        p.add_argument('--cuts', type=int)
    args = parser.parse_args()
    if args.mode in ('pdf', 'svg'):
        facts = board_facts(args.board) if args.board else {}
        for name, default in (('rows', None), ('cols', None), ('cuts', None), ('pitch', 2.54)):
            if getattr(args, name) is None:
                setattr(args, name, facts.get(name, default))
            if getattr(args, name) is None:
                parser.error('--%s or --board is needed' % name)
    {'pdf': measure_pdf, 'svg': measure_svg, 'pitch': measure_pitch}[args.mode](args)
    for name, ok, detail in results:
        print(('PASS ' if ok else 'FAIL ') + name + ('' if ok or not detail else ': ' + detail))
    return 0 if all(ok for _, ok, _ in results) else 1


if __name__ == '__main__':
    sys.exit(main())

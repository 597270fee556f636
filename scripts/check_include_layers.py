#!/usr/bin/env python3
"""Checks that the folders of editor/ or netcheck/ depend on each other one way only.

A file under ROOT/<a>/ with the line  #include "ROOT/<b>/..."  makes folder <a> depend on folder
<b>; files directly in ROOT/ make up the folder named ROOT. No chain of such dependencies may lead
back to where it started. In the core, data flows file -> model -> check -> view: model/ at the
bottom, file/, check/, edit/ and spice/ on it, cli/ on top. In the editor, shared state sits in
app/, the canvas, tools and panels build on it, and only the frame sees everything.

Also checked: a folder's private headers (ROOT/<a>/detail/) are included only from inside <a>; and
no header under the editor's canvas/, tools/ or panels/ includes the whole editor state
(app/editor_app.hpp): they are handed only the parts they use.

Usage: check_include_layers.py FOLDER   (the editor/ or netcheck/ folder)
Exits 1 and names the include lines at fault when a rule is broken.
"""
import re
import sys
from pathlib import Path

WHOLE_EDITOR = "app/editor_app.hpp"
KEPT_FROM_WHOLE_EDITOR = {"canvas", "tools", "panels"}


def folder_of(relative_path, root_name):
    parts = Path(relative_path).parts
    return parts[0] if len(parts) > 1 else root_name


def read_includes(root):
    """Yields (file relative to root, line number, included path relative to root)."""
    include = re.compile(r'^\s*#\s*include\s+"' + re.escape(root.name) + r'/([^"]+)"')
    for path in sorted(root.rglob("*")):
        if path.suffix not in (".hpp", ".cpp", ".h"):
            continue
        relative = path.relative_to(root).as_posix()
        for number, line in enumerate(path.read_text(errors="replace").splitlines(), 1):
            match = include.match(line)
            if match:
                yield relative, number, match.group(1)


def find_cycle(edges):
    """A list of folders forming a cycle, or None."""
    state = {}  # folder -> "open" while on the path, "done" after

    def visit(folder, path):
        state[folder] = "open"
        path.append(folder)
        for target in sorted(edges.get(folder, {})):
            if state.get(target) == "open":
                return path[path.index(target):] + [target]
            if target not in state:
                cycle = visit(target, path)
                if cycle:
                    return cycle
        path.pop()
        state[folder] = "done"
        return None

    for folder in sorted(edges):
        if folder not in state:
            cycle = visit(folder, [])
            if cycle:
                return cycle
    return None


def main():
    if len(sys.argv) != 2:
        print(__doc__)
        return 2
    root = Path(sys.argv[1]).resolve()
    edges = {}  # folder -> {folder it includes: first include line making it so}
    problems = []
    for relative, number, included in read_includes(root):
        source, target = folder_of(relative, root.name), folder_of(included, root.name)
        if source != target:
            edges.setdefault(source, {}).setdefault(target, f"{relative}:{number} includes {included}")
            if "/detail/" in included:
                problems.append(f"{relative}:{number}: includes a private header of {target}/")
        if (root.name == "editor" and included == WHOLE_EDITOR and relative.endswith(".hpp")
                and source in KEPT_FROM_WHOLE_EDITOR):
            problems.append(f"{relative}:{number}: a {source} header includes the whole editor state")
    if not edges:
        problems.append(f"no includes of {root.name}/ found under {root}")
    cycle = find_cycle(edges)
    if cycle:
        problems.append("folders include each other in a circle: " + " -> ".join(cycle))
        problems += [f"  {edges[a][b]}" for a, b in zip(cycle, cycle[1:])]
    for problem in problems:
        print(problem)
    if problems:
        return 1
    print(f"{root.name} folders include one way only:")
    for folder in sorted(edges):
        print(f"  {folder} -> {', '.join(sorted(edges[folder]))}")
    return 0


if __name__ == "__main__":
    sys.exit(main())

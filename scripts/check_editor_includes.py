#!/usr/bin/env python3
"""Checks that the editor's folders depend on each other one way only.

A file under editor/<a>/ with the line  #include "editor/<b>/..."  makes folder <a> depend on
folder <b>; files directly in editor/ (main, the frame) make up the folder "editor". No chain of
such dependencies may lead back to where it started: shared state sits in app/, the canvas, tools
and panels build on it, and only the frame sees everything.

Also checked: no header under canvas/, tools/ or panels/ includes the whole editor state
(app/editor_app.hpp); they are handed only the parts they use.

Usage: check_editor_includes.py EDITOR_FOLDER
Exits 1 and names the include lines at fault when a rule is broken.
"""
import re
import sys
from pathlib import Path

INCLUDE = re.compile(r'^\s*#\s*include\s+"editor/([^"]+)"')
WHOLE_EDITOR = "app/editor_app.hpp"
KEPT_FROM_WHOLE_EDITOR = {"canvas", "tools", "panels"}
# The board-against-circuit view is still written against the whole editor; it is to take the
# board and its panel state once the comparison comes from the core.
ALLOWED_WHOLE_EDITOR = set()


def folder_of(relative_path):
    parts = Path(relative_path).parts
    return parts[0] if len(parts) > 1 else "editor"


def read_includes(editor):
    """Yields (file relative to editor/, line number, included path relative to editor/)."""
    for path in sorted(editor.rglob("*")):
        if path.suffix not in (".hpp", ".cpp", ".h"):
            continue
        relative = path.relative_to(editor).as_posix()
        for number, line in enumerate(path.read_text(errors="replace").splitlines(), 1):
            match = INCLUDE.match(line)
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
    editor = Path(sys.argv[1])
    edges = {}  # folder -> {folder it includes: first include line making it so}
    problems = []
    for relative, number, included in read_includes(editor):
        source, target = folder_of(relative), folder_of(included)
        if source != target:
            edges.setdefault(source, {}).setdefault(target, f"{relative}:{number} includes {included}")
        if (included == WHOLE_EDITOR and relative.endswith(".hpp") and source in KEPT_FROM_WHOLE_EDITOR
                and relative not in ALLOWED_WHOLE_EDITOR):
            problems.append(f"{relative}:{number}: a {source} header includes the whole editor state")
    if not edges:
        problems.append(f"no editor includes found under {editor}")
    cycle = find_cycle(edges)
    if cycle:
        problems.append("folders include each other in a circle: " + " -> ".join(cycle))
        problems += [f"  {edges[a][b]}" for a, b in zip(cycle, cycle[1:])]
    for problem in problems:
        print(problem)
    if problems:
        return 1
    print("editor folders include one way only:")
    for folder in sorted(edges):
        print(f"  {folder} -> {', '.join(sorted(edges[folder]))}")
    return 0


if __name__ == "__main__":
    sys.exit(main())

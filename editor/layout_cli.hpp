// The `stripsmith --layout OUT.board.json [--board HxS] [--seconds S] [--seed N] [--iterations N]
// INPUT` command (--iterations bounds the work, for results that do not depend on load):
// lays out a circuit (JSON or SPICE), or the rest of a board file's embedded circuit around its
// placed parts, with the core's layout engine; no window needed.
#pragma once

namespace stripsmith {

/// True when the command line asks for a layout (some argument is `--layout`).
bool wantsLayoutCommand(int argc, char** argv);

/// Runs the layout command on main's argc/argv. Prints the board's area, links, cuts and the
/// lower bounds on stdout, errors on stderr. Returns 0 when a correct layout was written, 1 when
/// none fits (the --board size, or around the placed parts) or writing failed, 2 for unusable
/// arguments or input (the message names the file and line).
int runLayoutCommand(int argc, char** argv);

}  // namespace stripsmith

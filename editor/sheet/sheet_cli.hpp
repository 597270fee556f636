// The `stripsmith --sheet OUT.pdf|OUT.svg [--paper a4|letter] BOARD` command: no window needed.
#pragma once

namespace sheet {

/// True when the command line asks for a sheet (some argument is `--sheet`).
bool wantsSheetCommand(int argc, char** argv);

/// Runs the sheet command on main's own argc/argv (argv[0] is the program name; `--sheet OUT`,
/// `--paper P` and the board file may come in any order). Prints errors on stderr. Returns 0 on
/// success, 2 on bad arguments or a bad board file (the message names the file and line), 1 when
/// writing the sheet fails.
int runSheetCommand(int argc, char** argv);

}  // namespace sheet

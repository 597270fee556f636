// A window-free stand-in for `stripsmith --sheet ...`, for working on the sheet alone.
#include "editor/sheet/sheet_cli.hpp"

int main(int argc, char** argv) {
    return sheet::runSheetCommand(argc, argv);
}

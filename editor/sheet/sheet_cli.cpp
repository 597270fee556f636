#include "sheet_cli.hpp"

#include <iostream>
#include <string>
#include <string_view>

#include "netcheck/file/board_file.hpp"
#include "netcheck/file/file_io.hpp"
#include "netcheck/model/printable.hpp"
#include "paper.hpp"
#include "sheet.hpp"

namespace sheet {

namespace {

constexpr const char* kUsage =
    "usage: stripsmith --sheet OUT.pdf|OUT.svg [--paper a4|letter] BOARD.board.json\n";

struct SheetArgs {
    std::string out;
    std::string board;
    SheetOptions options;
};

/// Reads the arguments; on a mistake prints it with the usage and returns nullopt.
std::optional<SheetArgs> parseArgs(int argc, char** argv) {
    SheetArgs args;
    auto fail = [](const std::string& message) {
        std::cerr << "stripsmith: " << netcheck::escapeControls(message) << "\n" << kUsage;
        return std::nullopt;
    };
    for (int i = 1; i < argc; ++i) {
        std::string_view arg = argv[i];
        bool hasValue = i + 1 < argc;
        if (arg == "--sheet" || arg == "--paper") {
            if (!hasValue) return fail(std::string(arg) + " needs a value");
            std::string value = argv[++i];
            if (arg == "--sheet") {
                args.out = value;
                continue;
            }
            auto paper = parsePaper(value);
            if (!paper) return fail("unknown paper \"" + value + "\" (use a4 or letter)");
            args.options.paper = *paper;
        } else if (arg.size() > 1 && arg[0] == '-') {
            return fail("unknown option \"" + std::string(arg) + "\"");
        } else if (!args.board.empty()) {
            return fail("more than one board file given (\"" + args.board + "\", \"" +
                        std::string(arg) + "\")");
        } else {
            args.board = arg;
        }
    }
    if (args.out.empty()) return fail("--sheet needs the output file (.pdf or .svg)");
    if (!isSheetPath(args.out)) {
        return fail("\"" + args.out + "\" is not a .pdf or .svg file name");
    }
    if (args.board.empty()) return fail("no board file given");
    return args;
}

}  // namespace

bool wantsSheetCommand(int argc, char** argv) {
    for (int i = 1; i < argc; ++i) {
        if (std::string_view(argv[i]) == "--sheet") return true;
    }
    return false;
}

int runSheetCommand(int argc, char** argv) {
    auto args = parseArgs(argc, argv);
    if (!args) return 2;
    // The same size-limited reader as every other: it refuses folders, FIFOs and devices and
    // files over the limit before reading them.
    const netcheck::ReadLimits limits;
    auto text = netcheck::readFileLimited(args->board, limits.maxBytes);
    if (!text.ok()) {
        std::cerr << "stripsmith: " << text.error->describe() << "\n";
        return 2;
    }
    auto board = netcheck::readBoard(*text.value, args->board, limits);
    if (!board.ok()) {
        std::cerr << "stripsmith: " << board.error->describe() << "\n";
        return 2;
    }
    for (const std::string& note : board.notes) {
        std::cerr << "stripsmith: note: " << netcheck::escapeControls(note) << "\n";
    }
    if (auto error = exportSheet(*board.value, args->options, args->out)) {
        std::cerr << "stripsmith: " << netcheck::escapeControls(*error) << "\n";
        return 1;
    }
    return 0;
}

}  // namespace sheet

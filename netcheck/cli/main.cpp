// netcheck: checks a board file against its intended circuit, or prints the board's netlist.
// Exit status: 0 the board matches (warnings allowed), 1 errors found, 2 the input is unusable.
#include <exception>
#include <fstream>
#include <iostream>
#include <optional>
#include <sstream>
#include <string>
#include <vector>

#include "netcheck/board_file.hpp"
#include "netcheck/check.hpp"
#include "netcheck/circuit_loader.hpp"
#include "netcheck/report_format.hpp"

namespace {

constexpr const char* kVersion = "0.1.0";

constexpr const char* kUsage =
    "usage: netcheck [--circuit FILE] [--json] BOARD\n"
    "       netcheck --nets [--json] BOARD\n"
    "       netcheck --help | --version\n"
    "\n"
    "Checks a stripboard layout (BOARD, a .board.json file) against its intended circuit: the\n"
    "circuit embedded in the board file, or FILE. Prints every short, open and part mismatch with\n"
    "the holes concerned and a suggested fix. --nets prints the board's own connectivity instead.\n"
    "Exit status: 0 the board matches (warnings allowed), 1 errors found, 2 unusable input.\n";

enum class Exit { Match = 0, Errors = 1, BadInput = 2 };

struct Options {
    std::string boardFile;
    std::optional<std::string> circuitFile;
    bool json = false;
    bool nets = false;
    bool help = false;
    bool version = false;
};

struct UsageError {
    std::string message;
};

Options parseArgs(const std::vector<std::string>& args) {
    Options options;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& arg = args[i];
        if (arg == "--help" || arg == "-h") {
            options.help = true;
        } else if (arg == "--version") {
            options.version = true;
        } else if (arg == "--json") {
            options.json = true;
        } else if (arg == "--nets") {
            options.nets = true;
        } else if (arg == "--circuit") {
            if (i + 1 >= args.size()) throw UsageError{"--circuit needs a file name"};
            options.circuitFile = args[++i];
        } else if (arg.size() > 1 && arg[0] == '-') {
            throw UsageError{"unknown option " + arg};
        } else if (options.boardFile.empty()) {
            options.boardFile = arg;
        } else {
            throw UsageError{"only one board file, please (got " + options.boardFile + " and " +
                             arg + ")"};
        }
    }
    if (options.help || options.version) return options;
    if (options.boardFile.empty()) throw UsageError{"no board file given"};
    if (options.nets && options.circuitFile) {
        throw UsageError{"--nets prints the board's own netlist and takes no --circuit"};
    }
    return options;
}

std::optional<std::string> readFile(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) return std::nullopt;
    std::ostringstream text;
    text << in.rdbuf();
    if (in.bad()) return std::nullopt;
    return text.str();
}

template <class T>
std::optional<T> load(const std::string& path,
                      netcheck::ReadResult<T> (*reader)(std::string_view, std::string_view,
                                                        const netcheck::ReadLimits&)) {
    const std::optional<std::string> text = readFile(path);
    if (!text) {
        std::cerr << "netcheck: " << path << ": cannot read the file (missing or unreadable)\n";
        return std::nullopt;
    }
    netcheck::ReadResult<T> result = reader(*text, path, netcheck::ReadLimits{});
    if (!result.ok()) {
        std::cerr << "netcheck: "
                  << (result.error ? result.error->describe() : path + ": unreadable") << "\n";
        return std::nullopt;
    }
    for (const std::string& note : result.notes) std::cerr << "netcheck: note: " << note << "\n";
    return std::move(result.value);
}

Exit run(const Options& options) {
    std::optional<netcheck::Board> board = load(options.boardFile, &netcheck::readBoard);
    if (!board) return Exit::BadInput;
    if (options.nets) {
        std::cout << (options.json ? netcheck::netsJson(*board).dump(2) + "\n"
                                   : netcheck::formatNetsText(*board));
        return Exit::Match;
    }
    std::optional<netcheck::Circuit> circuit;
    if (options.circuitFile) {
        circuit = load(*options.circuitFile, &netcheck::loadCircuitText);
        if (!circuit) return Exit::BadInput;
    }
    const netcheck::CheckReport report = netcheck::check(*board, circuit ? &*circuit : nullptr);
    std::cout << (options.json ? netcheck::reportJson(report).dump(2) + "\n"
                               : netcheck::formatReportText(report, *board));
    return report.ok() ? Exit::Match : Exit::Errors;
}

}  // namespace

int main(int argc, char** argv) {
    try {
        const Options options = parseArgs(std::vector<std::string>(argv + 1, argv + argc));
        if (options.help) {
            std::cout << kUsage;
            return 0;
        }
        if (options.version) {
            std::cout << "netcheck " << kVersion << "\n";
            return 0;
        }
        return static_cast<int>(run(options));
    } catch (const UsageError& error) {
        std::cerr << "netcheck: " << error.message << "\n" << kUsage;
    } catch (const std::exception& error) {
        std::cerr << "netcheck: cannot check: " << error.what() << "\n";
    }
    return static_cast<int>(Exit::BadInput);
}

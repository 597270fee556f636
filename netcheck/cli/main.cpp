// netcheck: checks a board file against its intended circuit, or prints the board's netlist.
// Exit status: 0 the board matches (warnings allowed), 1 errors found, 2 the input is unusable
// or the report could not be written.
#include <cerrno>
#include <exception>
#include <iostream>
#include <optional>
#include <string>
#include <system_error>
#include <vector>

#include "netcheck/cli/bench_commands.hpp"
#include "netcheck/cli/cli_io.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/spice/circuit_loader.hpp"
#include "netcheck/file/file_io.hpp"
#include "netcheck/report/report_format.hpp"
#include "netcheck/model/printable.hpp"
#include "netcheck/repair/repair_plan.hpp"

namespace {

using netcheck_cli::emit;
using netcheck_cli::load;

constexpr const char* kVersion = STRIPSMITH_VERSION;  // from the top CMakeLists.txt

constexpr const char* kUsage =
    "usage: netcheck [--circuit FILE] [--json] [--repair OUT] BOARD\n"
    "       netcheck --nets [--json] BOARD\n"
    "       netcheck --voltages ... | --jfet-bias ...   (expected bench voltages; add --help)\n"
    "       netcheck --help | --version\n"
    "\n"
    "Checks a stripboard layout (BOARD, a .board.json file) against its intended circuit: the\n"
    "circuit embedded in the board file, or FILE. Prints every short, open and part mismatch with\n"
    "the holes concerned, and a repair plan: the fewest edits (cuts, links, leads) that bring the\n"
    "board back to the circuit, each verified to make nothing worse. --nets prints the board's own\n"
    "connectivity instead.\n"
    "  --repair OUT             also write the board with the whole plan done to OUT; the exit\n"
    "                           status then tells whether errors remain on the repaired board\n"
    "Exit status: 0 the board matches (warnings allowed), 1 errors found, 2 unusable input\n"
    "or the report could not be written.\n"
    "\n"
    "SPICE decks as FILE (.cir, .sp, .spice, .net, .ckt):\n"
    "  --ground NAME            net name of node 0 (default GND)\n"
    "  --spice-flatten          replace subcircuit calls by their parts (refs X1.R3)\n"
    "  --spice-sources MODE     ignore (default) or offboard: V sources become battery entries\n";

enum class Exit { Match = 0, Errors = 1, BadInput = 2 };

struct Options {
    std::string boardFile;
    std::optional<std::string> circuitFile;
    std::optional<std::string> repairedFile;
    netcheck::SpiceOptions spice;
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
        } else if (arg == "--repair") {
            if (i + 1 >= args.size() || args[i + 1].empty()) throw UsageError{"--repair needs an output file name"};
            options.repairedFile = args[++i];
        } else if (arg == "--ground") {
            if (i + 1 >= args.size() || args[i + 1].empty())
                throw UsageError{"--ground needs a net name"};
            options.spice.groundName = args[++i];
        } else if (arg == "--spice-flatten") {
            options.spice.flatten = true;
        } else if (arg == "--spice-sources") {
            const std::string mode = i + 1 < args.size() ? args[++i] : "";
            if (mode == "ignore") {
                options.spice.sources = netcheck::SpiceOptions::Sources::Ignore;
            } else if (mode == "offboard") {
                options.spice.sources = netcheck::SpiceOptions::Sources::Offboard;
            } else {
                throw UsageError{"--spice-sources takes ignore or offboard"};
            }
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
    if (options.nets && options.repairedFile) throw UsageError{"--nets and --repair do not go together"};
    return options;
}

// The board with the plan done, saved atomically; the status tells whether errors remain on it.
Exit writeRepaired(const std::string& path, const netcheck::Board& board, const netcheck::RepairPlan& plan,
                   const netcheck::Circuit* circuit) {
    const netcheck::Board repaired = netcheck::repairedBoard(board, plan);
    if (auto problem = netcheck::saveFileAtomically(path, netcheck::writeBoard(repaired))) {
        std::cerr << "netcheck: " << netcheck::escapeControls(*problem) << "\n";
        return Exit::BadInput;
    }
    return netcheck::check(repaired, circuit).ok() ? Exit::Match : Exit::Errors;
}

Exit run(const Options& options) {
    std::optional<netcheck::Board> board =
        load(options.boardFile, [](std::string_view text, std::string_view name) {
            return netcheck::readBoard(text, name);
        });
    if (!board) return Exit::BadInput;
    if (options.nets) {
        const bool written = emit(options.json ? netcheck::netsJson(*board).dump(2) + "\n"
                                               : netcheck::formatNetsText(*board));
        return written ? Exit::Match : Exit::BadInput;
    }
    std::optional<netcheck::Circuit> circuit;
    if (options.circuitFile) {
        circuit = load(*options.circuitFile, [&](std::string_view text, std::string_view name) {
            return netcheck::loadCircuitText(text, name, netcheck::ReadLimits{}, options.spice);
        });
        if (!circuit) return Exit::BadInput;
    }
    const netcheck::Circuit* against = circuit ? &*circuit : nullptr;
    netcheck::CheckReport report = netcheck::check(*board, against);
    const netcheck::RepairPlan plan = netcheck::planRepair(*board, against);
    netcheck::attachPlan(report, plan, *board, against);
    if (!emit(options.json ? netcheck::reportJson(report, &plan).dump(2) + "\n"
                           : netcheck::formatReportText(report, *board, &plan))) {
        return Exit::BadInput;
    }
    if (options.repairedFile) return writeRepaired(*options.repairedFile, *board, plan, against);
    return report.ok() ? Exit::Match : Exit::Errors;
}

}  // namespace

int main(int argc, char** argv) {
    if (const auto status =
            netcheck_cli::runBenchCommand(std::vector<std::string>(argv + 1, argv + argc))) {
        return *status;
    }
    try {
        const Options options = parseArgs(std::vector<std::string>(argv + 1, argv + argc));
        if (options.help) return emit(kUsage) ? 0 : static_cast<int>(Exit::BadInput);
        if (options.version) {
            return emit(std::string("netcheck ") + kVersion + "\n")
                       ? 0
                       : static_cast<int>(Exit::BadInput);
        }
        return static_cast<int>(run(options));
    } catch (const UsageError& error) {
        std::cerr << "netcheck: " << netcheck::escapeControls(error.message) << "\n" << kUsage;
    } catch (const std::exception& error) {
        std::cerr << "netcheck: cannot check: " << netcheck::escapeControls(error.what()) << "\n";
    }
    return static_cast<int>(Exit::BadInput);
}

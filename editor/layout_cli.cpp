#include "editor/layout_cli.hpp"

#include <chrono>
#include <cstdio>
#include <iostream>
#include <optional>
#include <string>
#include <string_view>

#include "netcheck/check/check.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/file/file_io.hpp"
#include "netcheck/layout/layout_engine.hpp"
#include "netcheck/model/board_size.hpp"
#include "netcheck/model/printable.hpp"
#include "netcheck/spice/circuit_loader.hpp"

namespace stripsmith {

namespace {

constexpr const char* kUsage =
    "usage: stripsmith --layout OUT.board.json [--board HxS] [--seconds S] [--seed N]\n"
    "                  [--iterations N] [--rails] INPUT\n"
    "       INPUT: a circuit file (JSON or SPICE deck) or a board file with its circuit\n";

struct LayoutArgs {
    std::string out;
    std::string input;
    int rows = 0;
    int cols = 0;
    double seconds = 10;
    unsigned long long seed = 1;
    long iterations = 1L << 40;  // the time budget ends the run unless this is given
    bool rails = false;
};

std::optional<LayoutArgs> parseArgs(int argc, char** argv) {
    LayoutArgs args;
    auto fail = [](const std::string& message) {
        std::cerr << "stripsmith: " << netcheck::escapeControls(message) << "\n" << kUsage;
        return std::nullopt;
    };
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        if (arg == "--layout" || arg == "--board" || arg == "--seconds" || arg == "--seed" ||
            arg == "--iterations") {
            if (i + 1 >= argc) return fail(arg + " needs a value");
            const std::string value = argv[++i];
            char extra = 0;
            if (arg == "--layout") {
                args.out = value;
            } else if (arg == "--board") {
                // Holes across x strips, the order every size is given in (board_size.hpp).
                if (std::sscanf(value.c_str(), "%dx%d%c", &args.cols, &args.rows, &extra) != 2 ||
                    args.rows < 1 || args.cols < 1 || args.rows > 1000 || args.cols > 1000)
                    return fail("--board wants HOLESxSTRIPS (holes across x strips), e.g. 24x10, not \"" +
                                value + "\"");
            } else if (arg == "--seconds") {
                if (std::sscanf(value.c_str(), "%lf%c", &args.seconds, &extra) != 1 ||
                    !(args.seconds > 0 && args.seconds <= 3600))
                    return fail("--seconds wants a number of seconds up to 3600, not \"" + value + "\"");
            } else if (arg == "--iterations") {
                if (std::sscanf(value.c_str(), "%ld%c", &args.iterations, &extra) != 1 ||
                    args.iterations < 0)
                    return fail("--iterations wants a whole number, not \"" + value + "\"");
            } else if (std::sscanf(value.c_str(), "%llu%c", &args.seed, &extra) != 1) {
                return fail("--seed wants a whole number, not \"" + value + "\"");
            }
        } else if (arg == "--rails") {
            args.rails = true;
        } else if (arg.size() > 1 && arg[0] == '-') {
            return fail("unknown option \"" + arg + "\"");
        } else if (!args.input.empty()) {
            return fail("more than one input file given");
        } else {
            args.input = arg;
        }
    }
    if (args.out.empty()) return fail("--layout needs the output board file");
    if (args.input.empty()) return fail("no circuit or board file given");
    return args;
}

// The circuit to lay out and, from a board file, the board whose placed parts stay. Nullopt
// after printing the reason.
struct Input {
    netcheck::Circuit circuit;
    std::optional<netcheck::Board> placed;
};

std::optional<Input> readInput(const std::string& path) {
    const netcheck::ReadLimits limits;
    auto text = netcheck::readFileLimited(path, limits.maxBytes);
    if (!text.ok()) {
        std::cerr << "stripsmith: " << text.error->describe() << "\n";
        return std::nullopt;
    }
    Input input;
    if (text.value->find("\"stripsmith-board\"") != std::string::npos) {
        auto board = netcheck::readBoard(*text.value, path, limits);
        if (!board.ok()) {
            std::cerr << "stripsmith: " << board.error->describe() << "\n";
            return std::nullopt;
        }
        if (!board.value->circuit) {
            std::cerr << "stripsmith: " << netcheck::escapeControls(path)
                      << ": the board file has no circuit to lay out\n";
            return std::nullopt;
        }
        input.circuit = *board.value->circuit;
        if (!board.value->parts.empty()) input.placed = std::move(*board.value);
    } else {
        auto circuit = netcheck::loadCircuitText(*text.value, path, limits);
        if (!circuit.ok()) {
            std::cerr << "stripsmith: " << circuit.error->describe() << "\n";
            return std::nullopt;
        }
        input.circuit = std::move(*circuit.value);
    }
    if (input.circuit.parts.empty()) {
        std::cerr << "stripsmith: " << netcheck::escapeControls(path) << ": the circuit has no parts\n";
        return std::nullopt;
    }
    return input;
}

}  // namespace

bool wantsLayoutCommand(int argc, char** argv) {
    for (int i = 1; i < argc; ++i) {
        if (std::string_view(argv[i]) == "--layout") return true;
    }
    return false;
}

int runLayoutCommand(int argc, char** argv) {
    const auto args = parseArgs(argc, argv);
    if (!args) return 2;
    const auto input = readInput(args->input);
    if (!input) return 2;
    netcheck::LayoutOptions options;
    options.seed = args->seed;
    options.iterations = args->iterations;
    options.maxRows = args->rows;
    options.maxCols = args->cols;
    options.rails = args->rails;
    const auto deadline =
        std::chrono::steady_clock::now() + std::chrono::duration<double>(args->seconds);
    options.stop = [&] { return std::chrono::steady_clock::now() >= deadline; };
    const netcheck::LayoutResult result =
        netcheck::layOut(input->circuit, options, input->placed ? &*input->placed : nullptr);
    if (!result.ok) {
        std::cerr << "stripsmith: no layout: " << result.problem << "\n";
        return 1;
    }
    netcheck::Board board = result.board;
    if (args->rows > 0) {  // the maker's board: keep its size
        board.rows = args->rows;
        board.cols = args->cols;
    }
    // The engine's own promise, checked again before anything is written.
    const netcheck::CheckReport report = netcheck::check(board);
    if (!report.ok()) {
        std::cerr << "stripsmith: internal error: the layout fails the check ("
                  << report.errors.front().message << "); nothing written\n";
        return 1;
    }
    if (auto error = netcheck::saveFileAtomically(args->out, netcheck::writeBoard(board))) {
        std::cerr << "stripsmith: " << netcheck::escapeControls(*error) << "\n";
        return 1;
    }
    const netcheck::LayoutScore& s = result.score;
    std::printf("area %ld holes (%s), %d links, %d cuts, link length %d\n", s.area(),
                netcheck::sizeInHoles(s.cols, s.rows).c_str(), s.links, s.cuts, s.linkLength);
    std::printf("lower bound: %d strips, area at least %ld holes; the part order found needs %d "
                "strips if no net changed strip\n",
                result.bounds.strips, result.bounds.area, result.bounds.orderStrips);
    std::printf("wrote %s (%ld part orders tried)\n", netcheck::escapeControls(args->out).c_str(),
                result.iterationsUsed);
    return 0;
}

}  // namespace stripsmith

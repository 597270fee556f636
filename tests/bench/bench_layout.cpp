// bench_layout --dzn FILE [--seconds S] [--seed N]: orders the columns of one open-stacks
// instance (tests/layout-bench/) with the layout engine's column ordering and prints one line,
// `strips N order P1 P2 ...` (products 1-based, in the order found). Exit 2 for unusable input.
//
// bench_layout --planted N [--stacked 0|1] [--cols C] [--seconds S]: N planted cases
// (planted_boards.hpp, seeds 1..N; with --cols, 10 strips of C holes): random compact correct boards stripped to their circuits and laid out again; one
// line per case and the median, worst and best ratio of the engine's area to the planted area.
#include <atomic>
#include <chrono>
#include <cstdio>
#include <fstream>
#include <sstream>
#include <string>

#include <algorithm>
#include <vector>

#include "netcheck/check/check.hpp"
#include "netcheck/layout/column_order.hpp"
#include "netcheck/layout/layout_engine.hpp"
#include "../layout_bench_file.hpp"
#include "planted_boards.hpp"

namespace {

int usage(const std::string& problem) {
    std::fprintf(stderr,
                 "bench_layout: %s\nusage: bench_layout --dzn FILE [--seconds S] [--seed N]\n"
                 "       bench_layout --planted N [--stacked 0|1] [--cols C] [--seconds S]\n",
                 problem.c_str());
    return 2;
}

int plantedCases(int count, bool stacked, double seconds, int fixedCols) {
    std::vector<double> ratios;
    int refused = 0;
    for (int seed = 1; seed <= count; ++seed) {
        std::mt19937 random(static_cast<unsigned>(seed));
        int rows = 6 + static_cast<int>(random() % 5);
        int cols = 8 + static_cast<int>(random() % 13);
        if (fixedCols > 0) {  // larger circuits: the tallest boards, this wide
            rows = 10;
            cols = fixedCols;
        }
        const netcheck::Board board = planted::plantedBoard(random, rows, cols, stacked);
        if (!netcheck::check(board).ok()) {  // the generator's own promise
            ++refused;
            continue;
        }
        const auto deadline = std::chrono::steady_clock::now() + std::chrono::duration<double>(seconds);
        netcheck::LayoutOptions options;
        options.seed = 1;
        options.iterations = 1L << 40;
        options.stop = [&] { return std::chrono::steady_clock::now() >= deadline; };
        const netcheck::LayoutResult result = netcheck::layOut(*board.circuit, options);
        if (!result.ok || !netcheck::check(result.board).ok()) {
            std::printf("case %d: %zu parts, planted %dx%d: no correct layout (%s)\n", seed,
                        board.parts.size(), rows, cols, result.problem.c_str());
            ratios.push_back(99);
            continue;
        }
        const double ratio = static_cast<double>(result.score.area()) / (rows * cols);
        ratios.push_back(ratio);
        std::printf("case %d: %zu parts, planted %dx%d = %d, engine %dx%d = %ld, ratio %.2f\n", seed,
                    board.parts.size(), rows, cols, rows * cols, result.score.rows,
                    result.score.cols, result.score.area(), ratio);
    }
    if (ratios.empty()) return 1;
    std::sort(ratios.begin(), ratios.end());
    std::printf("planted cases %zu (%d generated boards failed their own check), %s: median %.2f, "
                "worst %.2f, best %.2f\n",
                ratios.size(), refused, stacked ? "stacked columns" : "one part per column",
                ratios[ratios.size() / 2], ratios.back(), ratios.front());
    return 0;
}

}  // namespace

int main(int argc, char** argv) {
    std::string path;
    int planted = 0;
    int plantedCols = 0;
    bool stacked = true;
    double seconds = 10;
    unsigned long long seed = 1;
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        if (i + 1 >= argc) return usage(arg + " needs a value");
        const std::string value = argv[++i];
        try {
            if (arg == "--dzn") {
                path = value;
            } else if (arg == "--planted") {
                planted = std::stoi(value);
                if (planted < 1 || planted > 10000) return usage("--planted wants 1 to 10000");
            } else if (arg == "--cols") {
                plantedCols = std::stoi(value);
                if (plantedCols < 2 || plantedCols > 500) return usage("--cols wants 2 to 500");
            } else if (arg == "--stacked") {
                stacked = value != "0";
            } else if (arg == "--seconds") {
                seconds = std::stod(value);
                if (!(seconds > 0 && seconds <= 3600)) return usage("--seconds wants 0 to 3600");
            } else if (arg == "--seed") {
                seed = std::stoull(value);
            } else {
                return usage("unknown option " + arg);
            }
        } catch (const std::exception&) {
            return usage(arg + " wants a number, not \"" + value + "\"");
        }
    }
    if (planted > 0) return plantedCases(planted, stacked, seconds, plantedCols);
    if (path.empty()) return usage("--dzn FILE or --planted N is required");
    std::ifstream in(path);
    if (!in) return usage("cannot read " + path);
    std::ostringstream text;
    text << in.rdbuf();
    std::string problem;
    const auto instance = layout_bench::readInstance(text.str(), problem);
    if (!instance) {
        std::fprintf(stderr, "bench_layout: %s: %s\n", path.c_str(), problem.c_str());
        return 2;
    }
    const auto deadline = std::chrono::steady_clock::now() + std::chrono::duration<double>(seconds);
    netcheck::OrderOptions options;
    options.seed = seed;
    options.iterations = 1L << 62;
    options.stop = [&] { return std::chrono::steady_clock::now() >= deadline; };
    // When the best order was found, for the figures in DEVELOPERS.md (stderr: stdout is one line).
    const auto start = std::chrono::steady_clock::now();
    int bestStrips = -1;
    double bestAt = 0;
    options.progress = [&](const netcheck::OrderProgress& progress) {
        if (progress.bestStrips == bestStrips) return;
        bestStrips = progress.bestStrips;
        bestAt = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    };
    const netcheck::OrderResult result = netcheck::orderColumns(*instance, options);
    std::fprintf(stderr, "bench_layout: %d strips first reached after %.2f s, %ld iterations in all\n",
                 result.strips, bestStrips == result.strips ? bestAt : 0.0, result.iterationsUsed);
    std::string line = "strips " + std::to_string(result.strips) + " order";
    for (int column : result.order) line += " " + std::to_string(column + 1);
    std::printf("%s\n", line.c_str());
    return 0;
}

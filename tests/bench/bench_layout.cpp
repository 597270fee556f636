// bench_layout --dzn FILE [--seconds S] [--seed N]: orders the columns of one open-stacks
// instance (tests/layout-bench/) with the layout engine's column ordering and prints one line,
// `strips N order P1 P2 ...` (products 1-based, in the order found). Exit 2 for unusable input.
#include <atomic>
#include <chrono>
#include <cstdio>
#include <fstream>
#include <sstream>
#include <string>

#include "netcheck/layout/column_order.hpp"
#include "../layout_bench_file.hpp"

namespace {

int usage(const std::string& problem) {
    std::fprintf(stderr, "bench_layout: %s\nusage: bench_layout --dzn FILE [--seconds S] [--seed N]\n",
                 problem.c_str());
    return 2;
}

}  // namespace

int main(int argc, char** argv) {
    std::string path;
    double seconds = 10;
    unsigned long long seed = 1;
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        if (i + 1 >= argc) return usage(arg + " needs a value");
        const std::string value = argv[++i];
        try {
            if (arg == "--dzn") {
                path = value;
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
    if (path.empty()) return usage("--dzn FILE is required");
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

// Sheet export speed: a 60 x 40-hole board with 100 parts, written as PDF (target < 300 ms).
#include <benchmark/benchmark.h>

#include <cstdio>
#include <filesystem>
#include <string>

#include "editor/sheet/sheet.hpp"
#include "netcheck/model/board.hpp"

namespace {

/// 100 parts in rows: resistors lying 4 holes apart, a hole cut after each, links between rows.
netcheck::Board benchBoard() {
    netcheck::Board board;
    board.title = "Sheet benchmark";
    board.rows = 40;
    board.cols = 60;
    for (int i = 0; i < 100; ++i) {
        int row = (i / 10) * 4;
        int col = (i % 10) * 6;
        netcheck::Part part;
        part.ref = "R" + std::to_string(i + 1);
        part.kind = i % 3 == 0 ? "capacitor" : "resistor";
        part.value = i % 3 == 0 ? "100n" : "4k7";
        part.pins = {{"1", {row, col}}, {"2", {row + 1, col + 4}}};
        board.parts.push_back(part);
        board.cuts.push_back({{row, col + 5}, netcheck::Cut::Kind::Hole});
        board.links.push_back({{row + 2, col}, {row + 3, col + 2}, false, {}});
    }
    return board;
}

void exportPdf(benchmark::State& state) {
    netcheck::Board board = benchBoard();
    std::string path =
        (std::filesystem::temp_directory_path() / "stripsmith-bench-sheet.pdf").string();
    for (auto _ : state) {
        auto error = sheet::exportSheet(board, {}, path);
        if (error) state.SkipWithError(error->c_str());
    }
    std::remove(path.c_str());
}
BENCHMARK(exportPdf)->Unit(benchmark::kMillisecond);

void exportSvg(benchmark::State& state) {
    netcheck::Board board = benchBoard();
    std::string path =
        (std::filesystem::temp_directory_path() / "stripsmith-bench-sheet.svg").string();
    for (auto _ : state) {
        auto error = sheet::exportSheet(board, {}, path);
        if (error) state.SkipWithError(error->c_str());
    }
    std::remove(path.c_str());
}
BENCHMARK(exportSvg)->Unit(benchmark::kMillisecond);

}  // namespace

BENCHMARK_MAIN();

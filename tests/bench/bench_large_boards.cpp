// Boards at the documented limits (1,000 x 1,000 holes, 100,000 parts), taken the way the netcheck
// CLI takes them: read from the board file's text, checked, and the text report written. The goal
// is under 5 s for any board inside the limits (see docs/performance.md).
//   largeBoardNoCircuit: 100,000 parts and no circuit, so the report lists 200,000 islands.
//   largeBoardNetPerPin/N: the same parts against a circuit with one net per pin, and N cuts left
//     out so that N islands join two nets: N shorts, each located and given a suggested cut.
//   build-release/bin/bench_large_boards
#include <benchmark/benchmark.h>

#include <string>

#include "netcheck/check/check.hpp"
#include "netcheck/report/report_format.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/repair/repair_plan.hpp"

using namespace netcheck;

namespace {

constexpr int kSide = 1000;
constexpr int kColumnStep = 5;                  // a part every 5 columns: 200 columns of parts
constexpr int kPartColumns = kSide / kColumnStep;

// 100,000 standing two-pin parts (rows 2k and 2k+1, every 5th column), each pin on its own piece
// of strip: a cut two holes right of every part column. Leaving out the cut right of part column
// k in row r joins the pins of part columns k and k+1 there. `shorts` such cuts are left out, each
// in a row of its own.
Board partsBoard(int shorts) {
    Board board;
    board.rows = kSide;
    board.cols = kSide;
    for (int row = 0; row + 1 < kSide; row += 2) {
        for (int k = 0; k < kPartColumns; ++k) {
            const int col = k * kColumnStep;
            board.parts.push_back(Part{"R" + std::to_string(board.parts.size() + 1),
                                       "resistor",
                                       "1k",
                                       {{"1", Hole{row, col}}, {"2", Hole{row + 1, col}}},
                                       {}});
        }
    }
    for (int row = 0; row < kSide; ++row) {
        // The short of this row, if any: rows 0, 5, 10 ... each get one, at a column of their own.
        const bool shortHere = row % 5 == 0 && row / 5 < shorts;
        const int leftOut = shortHere ? (row / 5 * 7) % (kPartColumns - 1) : -1;
        for (int k = 0; k < kPartColumns; ++k) {
            if (k == leftOut) continue;
            board.cuts.push_back(Cut{Hole{row, k * kColumnStep + 2}, Cut::Kind::Hole});
        }
    }
    return board;
}

// The intended circuit: every pin a net of its own, so each island holding two pins is a short.
Circuit netPerPin(const Board& board) {
    Circuit circuit;
    for (const Part& part : board.parts) {
        circuit.parts[part.ref] = {part.kind, part.value, {}, {}};
        for (const Pin& pin : part.pins) {
            circuit.nets["N" + part.ref + "_" + pin.name] = {PinRef{part.ref, pin.name}};
        }
    }
    return circuit;
}

// What `netcheck board.json` does after reading the file: read, check, write the text report.
void readCheckReport(benchmark::State& state, const std::string& text, std::size_t wantErrors) {
    for (auto _ : state) {
        const ReadResult<Board> board = readBoard(text, "large.board.json");
        if (!board.ok()) {
            state.SkipWithError(board.error->describe().c_str());
            return;
        }
        CheckReport report = check(*board.value);
        if (report.errors.size() != wantErrors) {
            state.SkipWithError(("expected " + std::to_string(wantErrors) + " errors, found " +
                                 std::to_string(report.errors.size()))
                                    .c_str());
            return;
        }
        // As the CLI: the repair plan (a board this size is not searched, and says so).
        const RepairPlan plan = planRepair(*board.value);
        attachPlan(report, plan, *board.value);
        const std::string printed = formatReportText(report, *board.value, &plan);
        benchmark::DoNotOptimize(printed.data());
    }
    state.counters["file_MB"] = static_cast<double>(text.size()) / 1e6;
}

void largeBoardNoCircuit(benchmark::State& state) {
    readCheckReport(state, writeBoard(partsBoard(0)), 0);
}

void largeBoardNetPerPin(benchmark::State& state) {
    const int shorts = static_cast<int>(state.range(0));
    Board board = partsBoard(shorts);
    board.circuit = netPerPin(board);
    readCheckReport(state, writeBoard(board), static_cast<std::size_t>(shorts));
}

}  // namespace

// Seconds per run: one run each is enough to see the goal met or missed.
BENCHMARK(largeBoardNoCircuit)->Unit(benchmark::kMillisecond)->Iterations(1);
BENCHMARK(largeBoardNetPerPin)->Arg(0)->Arg(20)->Arg(200)->Unit(benchmark::kMillisecond)->Iterations(1);

BENCHMARK_MAIN();

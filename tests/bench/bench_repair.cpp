// The repair planner measured: time for a 60 x 40 board with 100 parts and one to three mistakes
// (Google Benchmark), and with --table the mutation harness's figures per mistake kind (restored,
// undone exactly or by an equally short plan, harmful fixes) for the README and DEVELOPERS.md.
//   build-release/bin/bench_repair                    the timings
//   build-release/bin/bench_repair --table [CASES]    the table (CASES per kind and board, default 20)
#include <benchmark/benchmark.h>

#include <cstdio>
#include <cstring>
#include <map>
#include <random>
#include <string>

#include "../mistakes.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/repair/repair_plan.hpp"

using namespace netcheck;

namespace {

// Boards with `count` mistakes that check with errors, made once per benchmark.
std::vector<Board> faultyBoards(int count) {
    std::mt19937 rng(4242);
    const Board board = mistakes::correctBoard(rng, 40, 60, 100);
    std::vector<Board> boards;
    while (boards.size() < 16) {
        if (auto mistake = mistakes::makeMistakes(rng, board, count)) boards.push_back(std::move(mistake->board));
    }
    return boards;
}

void planOnLargeBoard(benchmark::State& state) {
    const std::vector<Board> boards = faultyBoards(static_cast<int>(state.range(0)));
    std::size_t next = 0;
    int checks = 0;
    for (auto _ : state) {
        const RepairPlan plan = planRepair(boards[next++ % boards.size()]);
        checks += plan.checks;
        benchmark::DoNotOptimize(plan);
    }
    state.counters["checks_per_plan"] = benchmark::Counter(checks, benchmark::Counter::kAvgIterations);
}
BENCHMARK(planOnLargeBoard)->DenseRange(1, 3)->Unit(benchmark::kMillisecond);

struct Tally {
    int cases = 0, restored = 0, exact = 0, asShort = 0, harmfulSteps = 0, harmfulFixes = 0,
        unverifiedHarmful = 0;
};

void tally(Tally& row, const Board& correct, const mistakes::Mistake& mistake, int count) {
    const RepairPlan plan = planRepair(mistake.board);
    const Board repaired = repairedBoard(mistake.board, plan);
    ++row.cases;
    const bool restored = check(repaired).ok();
    row.restored += restored;
    row.exact += restored && repaired == correct;
    row.asShort += restored && static_cast<int>(plan.steps.size()) <= count;
    row.harmfulSteps += !mistakes::everyStepHelps(mistake.board, plan);
    CheckReport report = check(mistake.board);
    row.unverifiedHarmful += mistakes::harmfulOwnFixes(mistake.board, report);
    attachPlan(report, plan, mistake.board);
    row.harmfulFixes += mistakes::harmfulOwnFixes(mistake.board, report);
}

void printRow(const std::string& name, const Tally& row) {
    auto percent = [&](int part) { return row.cases ? 100.0 * part / row.cases : 0.0; };
    std::printf("| %s | %d | %.0f %% | %.0f %% | %.0f %% | %d | %d |\n", name.c_str(), row.cases,
                percent(row.restored), percent(row.asShort), percent(row.exact),
                row.harmfulSteps + row.harmfulFixes, row.unverifiedHarmful);
}

int printTable(int perKind) {
    std::mt19937 rng(20261204);
    std::vector<Board> boards;
    for (int i = 0; i < 4; ++i) boards.push_back(mistakes::correctBoard(rng, 20 + 10 * i, 30, 20 + 20 * i));
    std::map<std::string, Tally> rows;
    Tally singles, doubles;
    const auto& kinds = mistakes::mistakeKinds();
    for (const Board& board : boards) {
        for (std::size_t kind = 0; kind < kinds.size(); ++kind) {
            for (int i = 0; i < perKind; ++i) {
                if (auto mistake = mistakes::makeMistakes(rng, board, 1, kind)) {
                    tally(rows[kinds[kind].first], board, *mistake, 1);
                    tally(singles, board, *mistake, 1);
                }
            }
        }
        for (int i = 0; i < perKind * 3; ++i) {
            if (auto mistake = mistakes::makeMistakes(rng, board, 2)) tally(doubles, board, *mistake, 2);
        }
    }
    std::printf("| mistake | cases | restored | as short as the mistake | exact inverse | harmful edits offered | harmful before verification |\n");
    std::printf("|---|---|---|---|---|---|---|\n");
    for (const auto& [name, kind] : kinds) printRow(name, rows[name]);
    printRow("**every single mistake**", singles);
    printRow("**two mistakes at once**", doubles);
    return 0;
}

}  // namespace

int main(int argc, char** argv) {
    if (argc >= 2 && std::strcmp(argv[1], "--table") == 0) return printTable(argc >= 3 ? std::atoi(argv[2]) : 20);
    benchmark::Initialize(&argc, argv);
    benchmark::RunSpecifiedBenchmarks();
    benchmark::Shutdown();
    return 0;
}

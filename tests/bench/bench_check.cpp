// Speed of the full check (trace + compare against a circuit equal to the board's own copper, so
// there are no findings to locate) on generated boards from 10x10 to 1000x1000 holes, with parts,
// cuts and links in proportion to the holes (the 60x40 board with 100 parts sets the density), and
// Boost.Graph's connected_components over the same hole graph as a baseline, in the same run.
// The same boards are also re-checked through a Checker (as the editor does, keeping the copper),
// checked after a round trip through the board file (as the CLI and the editor hold them), and
// read field by field with no check at all (the floor).
//   build-release/bin/bench_check --benchmark_counters_tabular=true
#include <benchmark/benchmark.h>

#include <boost/graph/adjacency_list.hpp>
#include <boost/graph/connected_components.hpp>

#include <random>

#include "netcheck/file/board_file.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/check/circuit_capture.hpp"
#include "netcheck/check/connectivity.hpp"

using namespace netcheck;

namespace {

// One two-pin part per 24 holes (100 parts on 60x40), one cut per 12 holes, one link per 48. Leads
// go into distinct holes with copper, as on a sound layout.
Board generatedBoard(int rows, int cols, int parts) {
    std::mt19937 rng(12345);
    auto hole = [&] {
        return Hole{std::uniform_int_distribution<int>(0, rows - 1)(rng),
                    std::uniform_int_distribution<int>(0, cols - 2)(rng)};
    };
    Board board;
    board.rows = rows;
    board.cols = cols;
    const int holes = rows * cols;
    std::vector<char> taken(static_cast<std::size_t>(holes), 0);
    auto at = [&](Hole h) -> char& {
        return taken[static_cast<std::size_t>(h.row * cols + h.col)];
    };
    std::vector<char> cutAt(static_cast<std::size_t>(holes),
                            0);  // a board file holds each cut once
    for (int i = 0; i < holes / 12; ++i) {
        Cut cut{hole(), i % 2 ? Cut::Kind::Hole : Cut::Kind::Between};
        const char kindBit = cut.kind == Cut::Kind::Hole ? 1 : 2;
        while (cutAt[static_cast<std::size_t>(cut.hole.row * cols + cut.hole.col)] & kindBit)
            cut.hole = hole();
        cutAt[static_cast<std::size_t>(cut.hole.row * cols + cut.hole.col)] |= kindBit;
        if (cut.kind == Cut::Kind::Hole) at(cut.hole) = 1;
        board.cuts.push_back(cut);
    }
    // Two free holes one row apart in the same column (a standing part, or a short link).
    auto freePair = [&](Hole& a, Hole& b) {
        do {
            a = hole();
            b = Hole{a.row + 1 < rows ? a.row + 1 : a.row - 1, a.col};  // the bottom row pairs upwards
        } while (at(a) || at(b) || rows < 2);
        at(a) = at(b) = 1;
    };
    for (int i = 0; i < holes / 48; ++i) {
        Hole a, b;
        freePair(a, b);
        board.links.push_back(Link{a, b});
    }
    static const char* const kKinds[] = {"resistor", "capacitor", "diode", "electrolytic"};
    static const char* const kPins[][2] = {{"1", "2"}, {"1", "2"}, {"A", "K"}, {"+", "-"}};
    for (int i = 0; i < parts; ++i) {
        Hole a, b;
        freePair(a, b);
        board.parts.push_back(Part{"P" + std::to_string(i + 1),
                                   kKinds[i % 4],
                                   "1k",
                                   {{kPins[i % 4][0], a}, {kPins[i % 4][1], b}},
                                   {}});
    }
    // The circuit is the board's own connectivity: every island with two or more pins is a net.
    Circuit circuit;
    for (const Part& part : board.parts) circuit.parts[part.ref] = {part.kind, part.value, {}, {}};
    int net = 0;
    for (auto& group : boardNets(board)) {
        if (group.size() > 1) circuit.nets["N" + std::to_string(++net)] = std::move(group);
    }
    board.circuit = std::move(circuit);
    return board;
}

Board boardOfSide(int side) {
    return generatedBoard(side, side, side * side / 24);
}

void setCounters(benchmark::State& state, const Board& board) {
    state.counters["holes"] = board.holeCount();
    state.counters["ns_per_hole"] = benchmark::Counter(
        static_cast<double>(board.holeCount()),
        benchmark::Counter::kIsIterationInvariantRate | benchmark::Counter::kInvert);
}

void fullCheck(benchmark::State& state) {
    const Board board = boardOfSide(static_cast<int>(state.range(0)));
    for (auto _ : state) {
        CheckReport report = check(board);
        if (!report.ok()) state.SkipWithError("the generated board should check clean");
        benchmark::DoNotOptimize(report);
    }
    setCounters(state, board);
}

// The same board written to a board file and read back, as the CLI and the editor hold it: the
// reader builds the model in file order, so parts, nets and their pins lie in memory in the order
// the check reads them (a board built in memory part by part is the harder case above).
void loadedCheck(benchmark::State& state) {
    const Board generated = boardOfSide(static_cast<int>(state.range(0)));
    const ReadResult<Board> loaded = readBoard(writeBoard(generated), "generated.board.json");
    if (!loaded.ok()) {
        state.SkipWithError(loaded.error->message.c_str());
        return;
    }
    for (auto _ : state) {
        CheckReport report = check(*loaded.value);
        if (!report.ok()) state.SkipWithError("the loaded board should check clean");
        benchmark::DoNotOptimize(report);
    }
    setCounters(state, *loaded.value);
}

// The floor: every field of the model the check reads, read once in model order, and nothing
// else (no tracing, no lookups, no report).
void readModel(benchmark::State& state) {
    const Board board = boardOfSide(static_cast<int>(state.range(0)));
    for (auto _ : state) {
        std::size_t sum = 0;
        for (const Part& part : board.parts) {
            sum += part.ref.size() + part.kind.size() + part.value.size();
            for (const Pin& pin : part.pins)
                sum += pin.name.size() + static_cast<std::size_t>(pin.hole.row + pin.hole.col);
        }
        for (const Cut& cut : board.cuts) sum += static_cast<std::size_t>(cut.hole.col);
        for (const Link& link : board.links) sum += static_cast<std::size_t>(link.to.col);
        for (const auto& [ref, part] : board.circuit->parts)
            sum += ref.size() + part.kind.size() + part.value.size();
        for (const auto& [name, pins] : board.circuit->nets) {
            for (const PinRef& pin : pins) sum += pin.ref.size() + pin.pin.size();
        }
        benchmark::DoNotOptimize(sum);
    }
    setCounters(state, board);
}

// The editor's case: one Checker re-checks the board after every edit, keeping the copper it traced.
void recheck(benchmark::State& state) {
    const Board board = boardOfSide(static_cast<int>(state.range(0)));
    Checker checker;
    for (auto _ : state) {
        CheckReport report = checker.check(board);
        if (!report.ok()) state.SkipWithError("the generated board should check clean");
        benchmark::DoNotOptimize(report);
    }
    setCounters(state, board);
}

void traceOnly(benchmark::State& state) {
    const Board board = boardOfSide(static_cast<int>(state.range(0)));
    for (auto _ : state) {
        Connectivity copper(board);
        benchmark::DoNotOptimize(copper);
    }
    setCounters(state, board);
}

using Graph = boost::adjacency_list<boost::vecS, boost::vecS, boost::undirectedS>;

// Baseline: building the same hole graph and running connected_components on it.
void boostComponents(benchmark::State& state) {
    const Board board = boardOfSide(static_cast<int>(state.range(0)));
    const Connectivity copper(board);
    for (auto _ : state) {
        Graph graph(static_cast<std::size_t>(board.holeCount()));
        for (int r = 0; r < board.rows; ++r) {
            for (int c = 0; c + 1 < board.cols; ++c) {
                if (copper.joinsNext({r, c})) {
                    boost::add_edge(r * board.cols + c, r * board.cols + c + 1, graph);
                }
            }
        }
        for (const Link& link : board.links) {
            boost::add_edge(link.from.row * board.cols + link.from.col,
                            link.to.row * board.cols + link.to.col, graph);
        }
        std::vector<int> component(static_cast<std::size_t>(board.holeCount()));
        benchmark::DoNotOptimize(boost::connected_components(graph, component.data()));
    }
    setCounters(state, board);
}

void editorBoard(benchmark::State& state) {
    const Board board = generatedBoard(40, 60, 100);
    Checker checker;  // as the editor holds one
    for (auto _ : state) {
        CheckReport report = checker.check(board);
        benchmark::DoNotOptimize(report);
    }
    setCounters(state, board);
}

}  // namespace

BENCHMARK(fullCheck)->Arg(10)->Arg(30)->Arg(100)->Arg(300)->Arg(1000)->Unit(
    benchmark::kMicrosecond);
BENCHMARK(recheck)->Arg(10)->Arg(30)->Arg(100)->Arg(300)->Arg(1000)->Unit(benchmark::kMicrosecond);
BENCHMARK(loadedCheck)->Arg(10)->Arg(100)->Arg(1000)->Unit(benchmark::kMicrosecond);
BENCHMARK(readModel)->Arg(10)->Arg(100)->Arg(1000)->Unit(benchmark::kMicrosecond);
BENCHMARK(traceOnly)->Arg(10)->Arg(100)->Arg(1000)->Unit(benchmark::kMicrosecond);
BENCHMARK(boostComponents)->Arg(10)->Arg(100)->Arg(1000)->Unit(benchmark::kMicrosecond);
BENCHMARK(editorBoard)->Unit(benchmark::kMicrosecond);

BENCHMARK_MAIN();

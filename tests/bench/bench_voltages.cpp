// Speed of the bench voltages on a 100-part circuit: 16 common-emitter BJT stages (divider bias,
// collector and emitter resistors, a coupling capacitor: 6 parts each) chained from a 12 V
// battery, plus an LED with its resistor and a zener reference with its resistor. Goals (issue
// 16): the operating point in at most 50 ms, the tolerance analysis (Monte Carlo, 200 runs) in at
// most 1 s. The board has the circuit but no layout, so probe holes cost nothing here.
//   build-release/bin/bench_voltages
#include <benchmark/benchmark.h>

#include <string>

#include "netcheck/voltage/bench_voltages.hpp"
#include "netcheck/voltage/dc_deck.hpp"
#include "netcheck/voltage/ngspice_session.hpp"

using namespace netcheck;

namespace {

void addPart(Circuit& circuit, const std::string& ref, const std::string& kind,
             const std::string& value, std::vector<std::string> pins) {
    circuit.parts[ref] = CircuitPart{kind, value, std::move(pins), nlohmann::json::object()};
}

void join(Circuit& circuit, const std::string& net, const std::string& ref, const std::string& pin) {
    circuit.nets[net].push_back({ref, pin});
}

Board hundredPartBoard() {
    Circuit circuit;
    addPart(circuit, "BT1", "battery", "12V", {"+", "-"});
    join(circuit, "VCC", "BT1", "+");
    join(circuit, "GND", "BT1", "-");
    for (int stage = 1; stage <= 16; ++stage) {
        const std::string n = std::to_string(stage);
        addPart(circuit, "R" + n + "A", "resistor", "47k", {"1", "2"});
        addPart(circuit, "R" + n + "B", "resistor", "10k", {"1", "2"});
        addPart(circuit, "R" + n + "C", "resistor", "4k7", {"1", "2"});
        addPart(circuit, "R" + n + "E", "resistor", "1k", {"1", "2"});
        addPart(circuit, "Q" + n, "bjt", "BC547", {"C", "B", "E"});
        addPart(circuit, "C" + n, "capacitor", "100n", {"1", "2"});
        join(circuit, "VCC", "R" + n + "A", "1");
        join(circuit, "VCC", "R" + n + "C", "1");
        join(circuit, "B" + n, "R" + n + "A", "2");
        join(circuit, "B" + n, "R" + n + "B", "1");
        join(circuit, "B" + n, "Q" + n, "B");
        join(circuit, "B" + n, "C" + n, "2");
        join(circuit, "C" + n, "R" + n + "C", "2");
        join(circuit, "C" + n, "Q" + n, "C");
        join(circuit, "E" + n, "Q" + n, "E");
        join(circuit, "E" + n, "R" + n + "E", "1");
        join(circuit, "GND", "R" + n + "B", "2");
        join(circuit, "GND", "R" + n + "E", "2");
        // The coupling capacitor from the previous stage's collector.
        join(circuit, stage == 1 ? "IN" : "C" + std::to_string(stage - 1), "C" + n, "1");
    }
    addPart(circuit, "R90", "resistor", "1k", {"1", "2"});
    addPart(circuit, "LED1", "led", "green", {"A", "K"});
    addPart(circuit, "R91", "resistor", "2k2", {"1", "2"});
    addPart(circuit, "D1", "zener", "5V1", {"A", "K"});
    join(circuit, "VCC", "R90", "1");
    join(circuit, "LEDA", "R90", "2");
    join(circuit, "LEDA", "LED1", "A");
    join(circuit, "GND", "LED1", "K");
    join(circuit, "VCC", "R91", "1");
    join(circuit, "REF", "R91", "2");
    join(circuit, "REF", "D1", "K");
    join(circuit, "GND", "D1", "A");
    Board board;
    board.rows = 40;
    board.cols = 60;
    board.circuit = circuit;
    return board;
}

void operatingPoint(benchmark::State& state) {
    const Board board = hundredPartBoard();
    BenchOptions options;
    options.ranges = false;
    for (auto _ : state) {
        BenchVoltagesResult result = computeBenchVoltages(board, nullptr, options);
        if (!result.value) state.SkipWithError(result.error.c_str());
        benchmark::DoNotOptimize(result);
    }
    state.counters["parts"] = static_cast<double>(board.circuit->parts.size());
}
BENCHMARK(operatingPoint)->Unit(benchmark::kMillisecond);

void operatingPointOnly(benchmark::State& state) {
    const Board board = hundredPartBoard();
    const DcDeckResult built = buildDcDeck(*board.circuit, &board, {});
    const std::vector<std::string> lines = built.deck->lines(built.deck->nominal());
    const std::vector<std::string> nodes = built.deck->nodes();
    for (auto _ : state) benchmark::DoNotOptimize(runOperatingPoint(lines, nodes));
}
BENCHMARK(operatingPointOnly)->Unit(benchmark::kMillisecond);

void toleranceAnalysis(benchmark::State& state) {
    const Board board = hundredPartBoard();
    for (auto _ : state) {
        BenchVoltagesResult result = computeBenchVoltages(board, nullptr, {});
        if (!result.value) state.SkipWithError(result.error.c_str());
        benchmark::DoNotOptimize(result);
    }
}
BENCHMARK(toleranceAnalysis)->Unit(benchmark::kMillisecond)->Iterations(3);

}  // namespace

BENCHMARK_MAIN();

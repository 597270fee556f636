#include "netcheck/voltage/bench_voltages.hpp"

#include "netcheck/check/check.hpp"
#include "netcheck/check/circuit_capture.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/voltage/dc_deck.hpp"
#include "netcheck/voltage/ngspice_session.hpp"
#include "netcheck/voltage/probe_point.hpp"

namespace netcheck {

namespace {

void describeParts(const DcDeck& deck, BenchVoltages& out) {
    std::string open;
    for (const DcPart& part : deck.parts) {
        const DcModel& model = part.model;
        if (model.role == DcModel::Role::LeftOut) {
            out.notes.push_back(part.ref + " (" + part.part.kind + " " + part.part.value +
                                ") is left out: " + model.reason +
                                "; the nets on its pins have no figure, and the others assume "
                                "its pins draw no current");
        } else if (model.role == DcModel::Role::Open && model.reason != "open at DC") {
            open += (open.empty() ? "" : ", ") + part.ref;
        } else if (model.role == DcModel::Role::Simulated && part.part.kind != "resistor") {
            out.models.push_back(part.ref + ": " + model.summary);
        }
    }
    if (!open.empty()) out.notes.push_back(open + ": connectors taken as open (nothing plugged in)");
}

}  // namespace

const std::vector<std::string>& benchCautions() {
    static const std::vector<std::string> kCautions{
        "For extra-low-voltage circuits only (at most 50 V AC or 120 V ripple-free DC): never "
        "probe a mains circuit on stripboard.",
        "Black lead on the ground net; probe with the power on only where that is safe, and keep "
        "the probe tip from bridging two strips.",
        "The figures are estimates from typical part models: a reading far outside the range "
        "points to a fault, it does not prove one. Oscillators and switching circuits swing; the "
        "meter then shows an average.",
    };
    return kCautions;
}

BenchVoltagesResult computeBenchVoltages(const Board& board, const Circuit* circuit,
                                         const BenchOptions& options) {
    const Circuit used = circuit ? *circuit : board.circuit ? *board.circuit : captureCircuit(board);
    DcDeckResult built = buildDcDeck(used, &board, options.models);
    if (!built.deck) return {std::nullopt, built.error};
    const DcDeck& deck = *built.deck;
    const OperatingPoint point = runOperatingPoint(deck.lines(deck.nominal()), deck.nodes());
    if (!point.ok) return {std::nullopt, "no DC operating point: " + point.error};

    BenchVoltages out;
    out.ground = deck.nets[static_cast<std::size_t>(deck.ground)].name;
    std::vector<VoltageRange> ranges;
    for (const double volts : point.volts) ranges.push_back({volts, volts});
    if (options.ranges) {
        const ToleranceResult tolerances = analyseTolerances(deck, point.volts, options.tolerance);
        out.method = tolerances.method;
        out.failedRuns = tolerances.failedRuns;
        ranges = tolerances.ranges;
    } else {
        out.method = "none: nominal values only";
    }
    const std::vector<NetSettlement> settled = settleNets(deck, point.volts);
    const Connectivity copper(board);
    const ProbePoints probes(board, copper);
    bool anySplit = false;
    const auto add = [&](std::size_t i) {
        NetReading reading{deck.nets[i].name, settled[i].state, point.volts[i], ranges[i].low,
                           ranges[i].high, {}, settled[i].why, false, deck.nets[i].pins};
        reading.probe = probes.find(deck.nets[i].pins, reading.split);
        anySplit = anySplit || reading.split;
        out.nets.push_back(std::move(reading));
    };
    add(static_cast<std::size_t>(deck.ground));
    for (std::size_t i = 0; i < deck.nets.size(); ++i) {
        if (static_cast<int>(i) != deck.ground) add(i);
    }
    describeParts(deck, out);
    if (out.failedRuns > 0) {
        out.notes.push_back(std::to_string(out.failedRuns) +
                            " tolerance runs found no operating point and are left out");
    }
    if (circuit != nullptr || board.circuit) {
        if (!check(board, &used).ok()) {
            out.notes.push_back("the board does not match the circuit (run netcheck): these are "
                                "the readings of a correct board");
        }
    } else {
        out.notes.push_back("the board has no circuit: its copper is taken as the circuit");
    }
    if (anySplit) {
        out.notes.push_back("some nets are split on the board: the probe hole is on the part "
                            "holding most of the net's pins");
    }
    return {std::move(out), {}};
}

}  // namespace netcheck

// The layout engine (netcheck/layout/layout_engine): every layout it emits is checked by the
// project's own independent checker, netcheck::check, which must find zero errors and no bare
// link lying across a lead or touching another link. Circuits: the samples' embedded circuits
// and generated ones (fixed seeds). Work is bounded by iteration counts, never by time.
#include <doctest/doctest.h>

#include <algorithm>
#include <random>
#include <set>

#include "netcheck/check/check.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/layout/layout_engine.hpp"
#include "netcheck/layout/lead_rules.hpp"
#include "test_support.hpp"

namespace {

using test_support::readSample;

using netcheck::Board;
using netcheck::Circuit;
using netcheck::CircuitPart;
using netcheck::FindingType;
using netcheck::PinRef;

// The check's verdict in one line per finding that the engine must never cause.
std::string faults(const Board& board) {
    const netcheck::CheckReport report = netcheck::check(board);
    std::string text;
    for (const auto& finding : report.errors) text += std::string(finding.id()) + ": " + finding.message + "\n";
    for (const auto& finding : report.warnings) {
        if (finding.type == FindingType::LinkOverLead || finding.type == FindingType::LinksTouch ||
            finding.type == FindingType::LinksUnchecked) {
            text += std::string(finding.id()) + ": " + finding.message + "\n";
        }
    }
    return text;
}

// Every lead in its own hole, inside the board (the check counts shared holes too; this names
// the part).
void requireAllPinsPlaced(const Circuit& circuit, const Board& board) {
    for (const auto& entry : circuit.parts) {
        const std::string& ref = entry.first;  // CAPTURE takes a lambda: no structured binding
        CAPTURE(ref);
        const bool onBoard = board.findPart(ref) != nullptr;
        const bool offBoard = board.findOffboard(ref) != nullptr;
        CHECK(onBoard != offBoard);
        if (const netcheck::Part* placed = board.findPart(ref)) {
            for (const auto& pin : placed->pins) CHECK(board.contains(pin.hole));
        }
    }
}

// A random circuit: parts of the usual kinds, nets joining random pins (every pin on a net or
// left free), some off-board parts.
Circuit randomCircuit(std::mt19937& random, int partCount) {
    static const std::vector<std::string> kKinds{"resistor", "resistor", "capacitor", "electrolytic",
                                                 "diode", "led", "bjt", "mosfet", "regulator",
                                                 "trimmer", "ic", "header", "jack", "pot", "dc-jack"};
    Circuit circuit;
    std::vector<PinRef> pins;
    for (int i = 0; i < partCount; ++i) {
        const std::string kind = kKinds[random() % kKinds.size()];
        const std::string ref = "P" + std::to_string(i + 1);
        CircuitPart part{kind, "", {}, nlohmann::json::object()};
        std::vector<std::string> names;
        if (kind == "ic") {
            for (int p = 1; p <= (random() % 2 ? 8 : 14); ++p) names.push_back(std::to_string(p));
            part.pins = names;
        } else if (kind == "header") {
            for (int p = 1; p <= 2 + static_cast<int>(random() % 3); ++p) names.push_back(std::to_string(p));
            part.pins = names;
        } else {
            for (auto name : netcheck::findPartKind(kind)->pins) names.emplace_back(name);
        }
        if (kind == "bjt" && random() % 2) part.extra["pinout"] = "E-B-C";
        if (kind == "resistor" && random() % 3 == 0) part.extra["body"] = random() % 2 ? "standing" : "lying";
        circuit.parts[ref] = part;
        for (const auto& name : names) pins.push_back({ref, name});
    }
    std::shuffle(pins.begin(), pins.end(), random);
    const int nets = std::max(2, static_cast<int>(pins.size()) / 3);
    for (std::size_t i = 0; i < pins.size(); ++i) {
        if (random() % 10 == 0) continue;  // a pin on no net
        circuit.nets["N" + std::to_string(random() % static_cast<unsigned>(nets))].push_back(pins[i]);
    }
    return circuit;
}

// The lead rules of lead_rules.cpp, checked on a finished board: every lead of a part in one
// column (a DIP in two, 3 apart), two-lead parts as far apart as their kind allows, in-line
// parts on adjacent strips in their pinout's order. (The cuts under a DIP are covered by the
// check: without them its two pin columns would short.)
void requireLeadRules(const Circuit& circuit, const Board& board) {
    for (const netcheck::Part& part : board.parts) {
        CAPTURE(part.ref);
        const CircuitPart& source = circuit.parts.at(part.ref);
        std::vector<std::string> used;
        for (const auto& [net, pins] : circuit.nets) {
            for (const auto& pin : pins) if (pin.ref == part.ref) used.push_back(pin.pin);
        }
        const netcheck::LeadRule rule = netcheck::leadRule(source, used);
        const auto& pins = part.pins;
        if (rule.shape == netcheck::LeadShape::Dip) {
            const std::size_t half = pins.size() / 2;
            for (std::size_t i = 0; i < half; ++i) {
                const auto& a = pins[i].hole;
                const auto& b = pins[pins.size() - 1 - i].hole;
                CHECK(a.row == b.row);
                CHECK(std::abs(a.col - b.col) == 3);
            }
            continue;
        }
        for (const auto& pin : pins) CHECK(pin.hole.col == pins.front().hole.col);
        if (rule.shape == netcheck::LeadShape::TwoLead) {
            const int span = std::abs(pins[0].hole.row - pins[1].hole.row);
            CHECK(std::find(rule.spans.begin(), rule.spans.end(), span) != rule.spans.end());
        } else {
            const int step = pins.size() > 1 ? pins[1].hole.row - pins[0].hole.row : 1;
            CHECK(std::abs(step) == 1);
            for (std::size_t i = 1; i < pins.size(); ++i) {
                CHECK(pins[i].hole.row - pins[i - 1].hole.row == step);
                CHECK(pins[i].name == rule.pins[i]);  // standing order = the rule's pin order
            }
        }
    }
}

}  // namespace

TEST_CASE("layout engine") {
    const auto samples = test_support::sourceFiles("samples", ".board.json");
    REQUIRE(samples.size() >= 3);

    SUBCASE("each sample's circuit laid out from scratch checks clean") {
        for (const std::string& path : samples) {
            CAPTURE(path);
            const Board hand = readSample(path);
            REQUIRE(hand.circuit);
            netcheck::LayoutOptions options;
            options.iterations = 150;
            const netcheck::LayoutResult result = netcheck::layOut(*hand.circuit, options);
            REQUIRE_MESSAGE(result.ok, result.problem);
            CHECK(faults(result.board) == "");
            requireAllPinsPlaced(*hand.circuit, result.board);
            requireLeadRules(*hand.circuit, result.board);
            CHECK(result.score.rows == result.board.rows);
            CHECK(result.score.cols == result.board.cols);
            CHECK(result.score.links == static_cast<int>(result.board.links.size()));
            CHECK(result.score.cuts == static_cast<int>(result.board.cuts.size()));
            CHECK(result.board.rows >= result.bounds.strips);
            CHECK(result.score.area() >= result.bounds.area);
        }
    }

    SUBCASE("property: generated circuits (fixed seeds) lay out with zero errors") {
        for (unsigned seed = 1; seed <= 60; ++seed) {
            CAPTURE(seed);
            std::mt19937 random(seed);
            const Circuit circuit = randomCircuit(random, 2 + static_cast<int>(seed % 14));
            netcheck::LayoutOptions options;
            options.seed = seed;
            options.iterations = 20;
            const netcheck::LayoutResult result = netcheck::layOut(circuit, options);
            REQUIRE_MESSAGE(result.ok, result.problem);
            CHECK(faults(result.board) == "");
            requireAllPinsPlaced(circuit, result.board);
            requireLeadRules(circuit, result.board);
        }
    }

    SUBCASE("the same seed gives the same board") {
        const Board hand = readSample(samples.front());
        netcheck::LayoutOptions options;
        options.iterations = 60;
        CHECK(netcheck::layOut(*hand.circuit, options).board ==
              netcheck::layOut(*hand.circuit, options).board);
    }

    SUBCASE("place the rest: placed parts never move") {
        for (const std::string& path : samples) {
            CAPTURE(path);
            Board hand = readSample(path);
            // Keep every other part of the hand layout; drop the rest and all copper work.
            Board placed = hand;
            placed.parts.clear();
            placed.cuts.clear();
            placed.links.clear();
            placed.wires.clear();
            for (std::size_t i = 0; i < hand.parts.size(); i += 2) placed.parts.push_back(hand.parts[i]);
            netcheck::LayoutOptions options;
            options.iterations = 60;
            const netcheck::LayoutResult result = netcheck::layOut(*hand.circuit, options, &placed);
            REQUIRE_MESSAGE(result.ok, result.problem);
            for (const auto& kept : placed.parts) {
                CAPTURE(kept.ref);
                const netcheck::Part* after = result.board.findPart(kept.ref);
                REQUIRE(after != nullptr);
                CHECK(*after == kept);
            }
            CHECK(faults(result.board) == "");
            requireAllPinsPlaced(*hand.circuit, result.board);
        }
    }

    SUBCASE("lead rules per kind") {
        // Spans from the table in model/part_kinds.cpp (common practice on a 0.1 in grid).
        const auto rule = [](const char* kind, const char* body) {
            CircuitPart part{kind, "", {}, nlohmann::json::object()};
            if (*body) part.extra["body"] = body;
            return netcheck::leadRule(part, {});
        };
        CHECK(rule("resistor", "lying").spans == std::vector<int>{4, 5, 6});
        CHECK(rule("resistor", "standing").spans == std::vector<int>{1, 2});
        CHECK(rule("diode", "lying").spans == std::vector<int>{3, 4, 5});
        CHECK(rule("capacitor", "").spans == std::vector<int>{2});
        CHECK(rule("electrolytic", "").spans == std::vector<int>{1});
        CHECK(rule("led", "").spans == std::vector<int>{1});
        CHECK(rule("pot", "").shape == netcheck::LeadShape::OffBoard);
        CircuitPart bjt{"bjt", "", {}, nlohmann::json::object()};
        bjt.extra["pinout"] = "E-B-C";
        CHECK(netcheck::leadRule(bjt, {}).pins == std::vector<std::string>{"E", "B", "C"});
        CircuitPart ic{"ic", "", {"1", "2", "3", "4", "5", "6", "7", "8"}, nlohmann::json::object()};
        CHECK(netcheck::leadRule(ic, {}).shape == netcheck::LeadShape::Dip);
        // The README states the same rules: paste leadRulesMarkdown() there when they change.
        const std::string readme = test_support::readTextFile(test_support::sourcePath("README.md"));
        CHECK(readme.find(netcheck::leadRulesMarkdown()) != std::string::npos);
    }

    SUBCASE("a stop flag ends the run with a layout") {
        const Board hand = readSample(samples.front());
        netcheck::LayoutOptions options;
        options.iterations = 100000;
        int polls = 0;
        options.stop = [&] { return ++polls > 5; };
        const netcheck::LayoutResult result = netcheck::layOut(*hand.circuit, options);
        CHECK(result.ok);
        CHECK(result.iterationsUsed < 10);
        CHECK(faults(result.board) == "");
    }

    SUBCASE("a fixed board too small says so") {
        const Board hand = readSample(samples.front());
        netcheck::LayoutOptions options;
        options.iterations = 20;
        options.maxRows = 3;
        options.maxCols = 5;
        const netcheck::LayoutResult result = netcheck::layOut(*hand.circuit, options);
        CHECK_FALSE(result.ok);
        CHECK(!result.problem.empty());
    }
}

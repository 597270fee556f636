// The Circuit panel's "board against circuit" view, built in the core from the check's own
// matching. Besides worked cases, every sample and many mutated boards are compared with the
// check's findings: the view and the check must never disagree.
#include <doctest/doctest.h>

#include <algorithm>
#include <random>
#include <set>

#include "netcheck/check/board_vs_circuit.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/file/board_file.hpp"
#include "test_support.hpp"

using namespace netcheck;
using namespace test_support;

namespace {

Board sampleBoard(const std::string& name) {
    auto board = readBoard(readTextFile(sourcePath("samples/" + name)), name);
    REQUIRE(board.ok());
    return *board.value;
}

std::vector<std::string> refsOf(const CheckReport& report, FindingType type) {
    std::vector<std::string> refs;
    for (const auto* list : {&report.errors, &report.warnings}) {
        for (const Finding& finding : *list) {
            if (finding.type == type) refs.push_back(finding.ref);
        }
    }
    return refs;
}

// What the check says about the board's copper and parts against the circuit.
bool checkSaysSame(const CheckReport& report) {
    for (const auto* list : {&report.errors, &report.warnings}) {
        for (const Finding& finding : *list) {
            switch (finding.type) {
                case FindingType::Short: case FindingType::Open: case FindingType::MissingPart:
                case FindingType::ExtraPart: case FindingType::ValueMismatch:
                case FindingType::ValueDiffers: case FindingType::PinMismatch:
                    return false;
                default:
                    break;
            }
        }
    }
    return true;
}

void checkAgreement(const Board& board) {
    const CircuitDifference diff = compareBoardWithCircuit(board);
    const CheckReport report = check(board);
    CHECK(diff.partsOnlyOnBoard == refsOf(report, FindingType::ExtraPart));
    CHECK(diff.partsOnlyInCircuit == refsOf(report, FindingType::MissingPart));
    std::vector<std::string> valueRefs = refsOf(report, FindingType::ValueMismatch);
    for (const std::string& ref : refsOf(report, FindingType::ValueDiffers)) valueRefs.push_back(ref);
    std::vector<std::string> diffRefs;
    for (const PartDifference& part : diff.parts) diffRefs.push_back(part.ref);
    std::sort(valueRefs.begin(), valueRefs.end());
    std::sort(diffRefs.begin(), diffRefs.end());
    CHECK(diffRefs == valueRefs);
    // A short or open shows as a net that differs, and a net that differs is a short or open
    // (or a pin the board part lacks).
    CHECK(diff.same() == checkSaysSame(report));
}

}  // namespace

TEST_CASE("board against circuit") {
    SUBCASE("a correct board and its own circuit agree") {
        const auto diff = compareBoardWithCircuit(sampleBoard("flasher.board.json"));
        CHECK(diff.same());
        CHECK_FALSE(diff.nets.empty());
    }
    SUBCASE("the missing cut shows as DIS and THR joined, as the sample's expectation says") {
        // Reference: the sample's own "expect" block (a short between DIS and THR).
        const auto diff = compareBoardWithCircuit(sampleBoard("flasher-missing-cut.board.json"));
        CHECK_FALSE(diff.same());
        std::set<std::string> differing;
        for (const auto& net : diff.nets)
            if (!net.same()) differing.insert(net.net);
        CHECK(differing == std::set<std::string>{"DIS", "THR"});
        for (const auto& net : diff.nets) {
            if (net.net != "DIS") continue;
            CHECK(net.missingOnBoard.empty());
            CHECK(std::find(net.extraOnBoard.begin(), net.extraOnBoard.end(), PinRef{"U1", "6"}) !=
                  net.extraOnBoard.end());
        }
    }
    SUBCASE("parts and values on one side only") {
        Board board = sampleBoard("flasher.board.json");
        board.circuit->parts["R9"] = {"resistor", "1k", {"1", "2"}, nlohmann::json::object()};
        board.circuit->parts.erase("R3");
        board.circuit->parts.at("R2").value = "47000";  // same quantity, other spelling
        board.circuit->parts.at("R1").value = "2k2";
        const auto diff = compareBoardWithCircuit(board);
        CHECK(diff.partsOnlyInCircuit == std::vector<std::string>{"R9"});
        // R3 is still named in the circuit's nets, so the check does not call it extra.
        CHECK(diff.partsOnlyOnBoard.empty());
        REQUIRE(diff.parts.size() == 1);
        CHECK(diff.parts[0].ref == "R1");
        CHECK(diff.parts[0].circuitValue == "2k2");
    }
    SUBCASE("no circuit, nothing to compare") {
        Board board = sampleBoard("flasher.board.json");
        board.circuit.reset();
        CHECK(compareBoardWithCircuit(board).nets.empty());
    }
}

TEST_CASE("board against circuit agrees with the check") {
    SUBCASE("regression: a resistor placed end for end is the same in the view as in the check") {
        Board board = sampleBoard("flasher.board.json");
        const auto resistor = std::find_if(board.parts.begin(), board.parts.end(),
                                           [](const Part& p) { return p.kind == "resistor"; });
        REQUIRE(resistor != board.parts.end());
        std::swap(resistor->pins[0].hole, resistor->pins[1].hole);
        CHECK(check(board).ok());
        CHECK(compareBoardWithCircuit(board).same());
    }
    SUBCASE("regression: a board part with no value is a value difference in both") {
        Board board = sampleBoard("flasher.board.json");
        const auto resistor = std::find_if(board.parts.begin(), board.parts.end(),
                                           [](const Part& p) { return p.kind == "resistor"; });
        REQUIRE(resistor != board.parts.end());
        resistor->value.clear();
        const CircuitDifference diff = compareBoardWithCircuit(board);
        REQUIRE(diff.parts.size() == 1);
        CHECK(diff.parts[0].ref == resistor->ref);
        CHECK_FALSE(check(board).ok());
    }
    SUBCASE("every sample, and each with one random change") {
        std::mt19937 rng(20261204);  // fixed seed: the same boards every run
        std::size_t boards = 0;
        for (const std::string& path : sourceFiles("samples", ".board.json")) {
            CAPTURE(path);
            const Board sample = sampleBoard(path.substr(path.rfind('/') + 1));
            if (!sample.circuit) continue;
            checkAgreement(sample);
            ++boards;
            for (int trial = 0; trial < 40; ++trial) {
                Board board = sample;
                auto pick = [&](std::size_t n) { return std::uniform_int_distribution<std::size_t>(0, n - 1)(rng); };
                switch (trial % 4) {
                    case 0:
                        if (!board.cuts.empty()) board.cuts.erase(board.cuts.begin() + static_cast<long>(pick(board.cuts.size())));
                        break;
                    case 1:
                        board.cuts.push_back(Cut{Hole{static_cast<int>(pick(static_cast<std::size_t>(board.rows))),
                                                      static_cast<int>(pick(static_cast<std::size_t>(board.cols - 1)))},
                                                 Cut::Kind::Between});
                        break;
                    case 2: {
                        Part& part = board.parts[pick(board.parts.size())];
                        std::swap(part.pins.front().hole, part.pins.back().hole);
                        break;
                    }
                    default:
                        board.parts[pick(board.parts.size())].value = trial % 8 == 3 ? "" : "3k3";
                }
                CAPTURE(trial);
                checkAgreement(board);
                ++boards;
            }
        }
        CHECK(boards > 100);
    }
}

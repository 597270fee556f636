// Shared helpers for the core tests: finding files in the source tree and generating random but
// valid boards with a caller-owned, fixed-seed generator.
#pragma once

#include <algorithm>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <random>
#include <set>
#include <sstream>
#include <stdexcept>
#include <string>
#include <vector>

#include <doctest/doctest.h>

#include "netcheck/check/check.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/model/board.hpp"
#include "netcheck/model/part_kinds.hpp"
#include "netcheck/repair/finding_fixes.hpp"

namespace test_support {

/// A path inside the source tree: the STRIPSMITH_SOURCE environment variable when set, else the
/// compile definition of the same name.
inline std::string sourcePath(const std::string& relative) {
    const char* fromEnvironment = std::getenv("STRIPSMITH_SOURCE");
#ifdef STRIPSMITH_SOURCE
    const std::string root = fromEnvironment ? fromEnvironment : STRIPSMITH_SOURCE;
#else
    const std::string root = fromEnvironment ? fromEnvironment : ".";
#endif
    return root + "/" + relative;
}

/// The check with each short's and open's own fix found, as the reports give them.
inline netcheck::CheckReport checkWithFixes(const netcheck::Board& board,
                                            const netcheck::Circuit* circuit = nullptr) {
    netcheck::CheckReport report = netcheck::check(board, circuit);
    netcheck::suggestFixes(report, board, circuit);
    return report;
}

/// The whole file as bytes; throws when it cannot be read.
inline std::string readTextFile(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw std::runtime_error("cannot read " + path);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

/// A board file that must read (a sample, or one a test wrote).
inline netcheck::Board readSample(const std::string& path) {
    auto read = netcheck::readBoard(readTextFile(path), path);
    REQUIRE(read.ok());
    return *read.value;
}

/// Files in a source-tree folder whose names end with `suffix`, sorted; empty if no folder.
inline std::vector<std::string> sourceFiles(const std::string& folder, const std::string& suffix) {
    std::vector<std::string> files;
    std::error_code error;
    for (const auto& entry : std::filesystem::directory_iterator(sourcePath(folder), error)) {
        const std::string name = entry.path().filename().string();
        if (name.size() >= suffix.size() && name.ends_with(suffix)) {
            files.push_back(entry.path().string());
        }
    }
    std::sort(files.begin(), files.end());
    return files;
}

/// Shape of the boards randomBoard makes. Densities are per hole of the board.
struct RandomBoardOptions {
    int minRows = 1;
    int maxRows = 30;
    int minCols = 2;
    int maxCols = 40;
    double partsPerHole = 0.03;
    double cutsPerHole = 0.05;
    double linksPerHole = 0.02;
    int maxOffboard = 3;
    double padsChance = 0.1;     ///< chance of a "pads" board (no cuts then)
    double circuitChance = 0.5;  ///< chance of an embedded circuit
};

namespace detail {

inline int uniform(std::mt19937& rng, int low, int high) {
    return std::uniform_int_distribution<int>(low, high)(rng);
}

inline bool chance(std::mt19937& rng, double p) {
    return std::bernoulli_distribution(std::clamp(p, 0.0, 1.0))(rng);
}

inline int countFor(std::mt19937& rng, double perHole, int holes) {
    const double mean = perHole * holes;
    return mean <= 0 ? 0 : std::poisson_distribution<int>(mean)(rng);
}

inline netcheck::Hole randomHole(std::mt19937& rng, const netcheck::Board& board) {
    return {uniform(rng, 0, board.rows - 1), uniform(rng, 0, board.cols - 1)};
}

template <class T>
const T& pick(std::mt19937& rng, const std::vector<T>& items) {
    return items[static_cast<std::size_t>(uniform(rng, 0, static_cast<int>(items.size()) - 1))];
}

/// Pin names of a kind: its table names, or 1..N for numbered kinds and unknown kinds.
inline std::vector<std::string> pinNames(std::mt19937& rng, const std::string& kind) {
    std::vector<std::string> names;
    if (const netcheck::PartKind* known = netcheck::findPartKind(kind);
        known && !known->pins.empty()) {
        for (std::string_view pin : known->pins) names.emplace_back(pin);
        return names;
    }
    const int count = uniform(rng, 2, 3);
    for (int i = 1; i <= count; ++i) names.push_back(std::to_string(i));
    return names;
}

inline void addCuts(std::mt19937& rng, netcheck::Board& board, const RandomBoardOptions& options) {
    if (board.copper != netcheck::CopperPattern::Strips) return;
    std::set<netcheck::Cut> seen;
    const int count = countFor(rng, options.cutsPerHole, board.holeCount());
    for (int i = 0; i < count; ++i) {
        netcheck::Cut cut{randomHole(rng, board), netcheck::Cut::Kind::Hole};
        if (board.cols >= 2 && chance(rng, 0.5)) {
            cut.kind = netcheck::Cut::Kind::Between;
            cut.hole.col = uniform(rng, 0, board.cols - 2);
        }
        if (seen.insert(cut).second) board.cuts.push_back(cut);
    }
}

inline void addParts(std::mt19937& rng, netcheck::Board& board, const RandomBoardOptions& options) {
    static const std::vector<std::string> kKinds{
        "resistor", "capacitor", "electrolytic", "diode",   "led", "bjt",
        "jfet",     "mosfet",    "regulator",    "trimmer", "ic",  "mystery-box"};
    static const std::vector<std::string> kValues{"4k7", "100n", "10u", "1N4148", "", "B100k"};
    const int count = std::max(1, countFor(rng, options.partsPerHole, board.holeCount()));
    for (int i = 0; i < count; ++i) {
        netcheck::Part part;
        part.ref = "P" + std::to_string(i + 1);
        part.kind = pick(rng, kKinds);
        part.value = pick(rng, kValues);
        for (const std::string& name : pinNames(rng, part.kind)) {
            part.pins.push_back({name, randomHole(rng, board)});
        }
        if (chance(rng, 0.2)) part.extra["rotation"] = 90 * uniform(rng, 0, 3);
        board.parts.push_back(std::move(part));
    }
}

inline void addLinks(std::mt19937& rng, netcheck::Board& board, const RandomBoardOptions& options) {
    if (board.holeCount() < 2) return;
    const int count = countFor(rng, options.linksPerHole, board.holeCount());
    for (int i = 0; i < count; ++i) {
        netcheck::Link link{randomHole(rng, board), randomHole(rng, board), chance(rng, 0.2),
                            nlohmann::json::object()};
        if (link.from != link.to) board.links.push_back(std::move(link));
    }
}

inline netcheck::Endpoint randomEndpoint(std::mt19937& rng, const netcheck::Board& board) {
    if (board.offboard.empty() || chance(rng, 0.4)) {
        return netcheck::Endpoint::atHole(randomHole(rng, board));
    }
    const netcheck::OffboardPart& part = pick(rng, board.offboard);
    return netcheck::Endpoint::atLug({part.ref, pick(rng, part.pins)});
}

inline void addOffboard(std::mt19937& rng, netcheck::Board& board,
                        const RandomBoardOptions& options) {
    static const std::vector<std::string> kKinds{"pot",     "jack",    "stereo-jack",
                                                 "dc-jack", "battery", "switch"};
    static const std::vector<std::string> kColours{"", "red", "black", "yellow"};
    const int count = uniform(rng, 0, options.maxOffboard);
    for (int i = 0; i < count; ++i) {
        netcheck::OffboardPart part;
        part.ref = "X" + std::to_string(i + 1);
        part.kind = pick(rng, kKinds);
        part.value = part.kind == "pot" ? "B100k" : "";
        part.pins = pinNames(rng, part.kind);
        board.offboard.push_back(std::move(part));
    }
    const int wires = uniform(rng, 0, 2 * count + 1);
    for (int i = 0; i < wires; ++i) {
        netcheck::Wire wire{randomEndpoint(rng, board), randomEndpoint(rng, board),
                            pick(rng, kColours), nlohmann::json::object()};
        if (!(wire.from == wire.to)) board.wires.push_back(std::move(wire));
    }
}

// Nets built from the board's own pins, each pin in at most one net.
inline void addCircuit(std::mt19937& rng, netcheck::Board& board) {
    netcheck::Circuit circuit;
    std::vector<netcheck::PinRef> pins;
    for (const netcheck::Part& part : board.parts) {
        circuit.parts[part.ref] = {part.kind, part.value, {}, nlohmann::json::object()};
        for (const netcheck::Pin& pin : part.pins) pins.push_back({part.ref, pin.name});
    }
    std::shuffle(pins.begin(), pins.end(), rng);
    const int nets = uniform(rng, 1, 4);
    for (std::size_t i = 0; i < pins.size(); ++i) {
        circuit.nets["N" + std::to_string(static_cast<int>(i) % nets + 1)].push_back(pins[i]);
    }
    board.circuit = std::move(circuit);
}

}  // namespace detail

/// A random board that is valid by the board file rules (unique refs, holes on the board, cuts
/// only on strip boards and never twice, wire ends on existing lugs, each circuit pin in one net).
/// Pins may share holes or sit on hole cuts: the file allows that; the checker reports it.
inline netcheck::Board randomBoard(std::mt19937& rng, const RandomBoardOptions& options = {}) {
    netcheck::Board board;
    board.rows = detail::uniform(rng, options.minRows, options.maxRows);
    board.cols = detail::uniform(rng, options.minCols, options.maxCols);
    board.title = "random " + std::to_string(board.rows) + "x" + std::to_string(board.cols);
    board.copper = detail::chance(rng, options.padsChance) ? netcheck::CopperPattern::Pads
                                                           : netcheck::CopperPattern::Strips;
    detail::addCuts(rng, board, options);
    detail::addParts(rng, board, options);
    detail::addLinks(rng, board, options);
    detail::addOffboard(rng, board, options);
    if (detail::chance(rng, options.circuitChance)) detail::addCircuit(rng, board);
    return board;
}

}  // namespace test_support

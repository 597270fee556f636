// Board file v1: reading, writing, round trips over the samples and over random boards.
#include <doctest/doctest.h>

#include <random>

#include "netcheck/file/board_file.hpp"
#include "test_support.hpp"

using namespace netcheck;

namespace {

// The board file example of the format description, with the jack J1 that its last wire names
// added to "offboard" (a wire may only end on a lug of a declared off-board part).
constexpr std::string_view kExample = R"({
  "format": "stripsmith-board",
  "version": 1,
  "title": "free text",
  "board": { "rows": 10, "cols": 24, "pitch_mm": 2.54, "copper": "strips" },
  "cuts": ["C5", "D7|D8"],
  "parts": [
    { "ref": "R1", "kind": "resistor", "value": "4k7", "pins": { "1": "A3", "2": "E3" } },
    { "ref": "Q1", "kind": "bjt", "value": "NPN general purpose", "pins": { "C": "B9", "B": "C9", "E": "D9" } }
  ],
  "links": [ { "from": "A1", "to": "C1" } ],
  "offboard": [ { "ref": "VR1", "kind": "pot", "value": "B100k", "pins": ["1", "2", "3"] },
                { "ref": "J1", "kind": "jack", "value": "", "pins": ["T", "S"] } ],
  "wires": [ { "from": "VR1.2", "to": "B3", "color": "yellow" }, { "from": "VR1.1", "to": "J1.S" } ],
  "circuit": {
    "parts": { "R1": { "kind": "resistor", "value": "4.7k" } },
    "nets": { "VCC": ["R1.1", "Q1.C"], "GND": ["VR1.1"] }
  }
})";

Board readOk(std::string_view text) {
    const ReadResult<Board> result = readBoard(text, "test.board.json");
    if (!result.ok()) FAIL(result.error->describe());
    return *result.value;
}

// A minimal valid file with `body` spliced in after the board object.
std::string minimal(const std::string& body,
                    const std::string& board = R"({"rows": 4, "cols": 6})") {
    return R"({"format": "stripsmith-board", "version": 1, "board": )" + board + body + "}";
}

}  // namespace

TEST_CASE("board file") {
    SUBCASE("the format example reads as written") {
        const Board board = readOk(kExample);
        CHECK(board.title == "free text");
        CHECK(board.rows == 10);
        CHECK(board.cols == 24);
        CHECK(board.pitchMm == 2.54);
        CHECK(board.copper == CopperPattern::Strips);
        REQUIRE(board.cuts.size() == 2);
        // "C5": strip C (row 2), hole 5 (col 4); "D7|D8": between holes 7 and 8 of strip D.
        CHECK(board.cuts[0] == Cut{Hole{2, 4}, Cut::Kind::Hole});
        CHECK(board.cuts[1] == Cut{Hole{3, 6}, Cut::Kind::Between});
        REQUIRE(board.parts.size() == 2);
        CHECK(board.parts[0].ref == "R1");
        CHECK(board.parts[0].value == "4k7");
        // Pins keep file order: C, B, E (not sorted).
        REQUIRE(board.parts[1].pins.size() == 3);
        CHECK(board.parts[1].pins[0] == Pin{"C", Hole{1, 8}});
        CHECK(board.parts[1].pins[1] == Pin{"B", Hole{2, 8}});
        CHECK(board.parts[1].pins[2] == Pin{"E", Hole{3, 8}});
        REQUIRE(board.links.size() == 1);
        CHECK(board.links[0].from == Hole{0, 0});
        CHECK(board.links[0].to == Hole{2, 0});
        CHECK_FALSE(board.links[0].copperSide);
        REQUIRE(board.offboard.size() == 2);
        CHECK(board.offboard[0].pins == std::vector<std::string>{"1", "2", "3"});
        REQUIRE(board.wires.size() == 2);
        CHECK(board.wires[0].from == Endpoint::atLug({"VR1", "2"}));
        CHECK(board.wires[0].to == Endpoint::atHole(Hole{1, 2}));
        CHECK(board.wires[0].color == "yellow");
        CHECK(board.wires[1].color.empty());
        REQUIRE(board.circuit.has_value());
        CHECK(board.circuit->parts.at("R1").value == "4.7k");
        CHECK(board.circuit->nets.at("VCC") == std::vector<PinRef>{{"R1", "1"}, {"Q1", "C"}});
        CHECK(board.circuit->netOf({"VR1", "1"}) == "GND");
    }

    SUBCASE("read, write, read gives the same board") {
        const Board board = readOk(kExample);
        const std::string written = writeBoard(board);
        CHECK(readOk(written) == board);
        CHECK(writeBoard(readOk(written)) == written);
    }

    SUBCASE("written keys come in the documented order") {
        const std::string written = writeBoard(readOk(kExample));
        std::size_t last = 0;
        for (const char* key : {"\"format\"", "\"version\"", "\"title\"", "\"board\"", "\"rows\"",
                                "\"cols\"", "\"pitch_mm\"", "\"copper\"", "\"cuts\"", "\"parts\"",
                                "\"links\"", "\"offboard\"", "\"wires\"", "\"circuit\""}) {
            CAPTURE(key);
            const std::size_t at = written.find(key);
            REQUIRE(at != std::string::npos);
            CHECK(at > last);
            last = at;
        }
        CHECK(written.find("\n  \"version\": 1") != std::string::npos);  // 2-space indent
    }

    SUBCASE("hole names are read in any case and written in upper case") {
        const Board board = readOk(minimal(R"(, "cuts": ["b2", "c3|C4"],
            "parts": [{"ref": "R1", "kind": "resistor", "pins": {"1": "a1", "2": "d6"}}])"));
        CHECK(board.cuts[0] == Cut{Hole{1, 1}, Cut::Kind::Hole});
        CHECK(board.cuts[1] == Cut{Hole{2, 2}, Cut::Kind::Between});
        CHECK(board.parts[0].pins[1].hole == Hole{3, 5});
        const std::string written = writeBoard(board);
        CHECK(written.find("\"D6\"") != std::string::npos);
        CHECK(written.find("\"C3|C4\"") != std::string::npos);
        CHECK(written.find("\"d6\"") == std::string::npos);
    }

    SUBCASE("a between cut may be written right to left") {
        const Board board = readOk(minimal(R"(, "cuts": ["D5|D4"])", R"({"rows": 5, "cols": 6})"));
        CHECK(board.cuts[0] == Cut{Hole{3, 3}, Cut::Kind::Between});
    }

    SUBCASE("unknown keys are kept at every level") {
        const std::string text = R"({
          "format": "stripsmith-board", "version": 1, "future": {"a": [1, 2]},
          "board": {"rows": 3, "cols": 5, "finish": "tinned"},
          "parts": [{"ref": "R1", "kind": "resistor", "value": "1k", "pins": {"1": "A1", "2": "A5"},
                     "body": "flat", "rotation": 90, "pinout": "EBC"}],
          "links": [{"from": "A1", "to": "C1", "sleeve": "green"}],
          "offboard": [{"ref": "S1", "kind": "switch", "pins": ["1", "2"], "panel": "top"}],
          "wires": [{"from": "S1.1", "to": "B2", "length_mm": 80}],
          "circuit": {"parts": {"R1": {"kind": "resistor", "value": "1k", "tolerance": "1%"}},
                      "nets": {}, "source": "hand-drawn"}
        })";
        const Board board = readOk(text);
        CHECK(board.extra == nlohmann::json{{"future", {{"a", {1, 2}}}}});
        CHECK(board.boardExtra == nlohmann::json{{"finish", "tinned"}});
        CHECK(board.parts[0].extra ==
              nlohmann::json{{"body", "flat"}, {"rotation", 90}, {"pinout", "EBC"}});
        CHECK(board.links[0].extra == nlohmann::json{{"sleeve", "green"}});
        CHECK(board.offboard[0].extra == nlohmann::json{{"panel", "top"}});
        CHECK(board.wires[0].extra == nlohmann::json{{"length_mm", 80}});
        CHECK(board.circuit->extra == nlohmann::json{{"source", "hand-drawn"}});
        CHECK(board.circuit->parts.at("R1").extra == nlohmann::json{{"tolerance", "1%"}});
        CHECK(readOk(writeBoard(board)) == board);
    }

    SUBCASE("numbers of unknown keys keep their spelling, byte for byte") {
        // Each of these reads as a double or an integer that would be written otherwise:
        // 1.2345678901234568e+29, 0, 100.0, 2.54, 1e-07.
        const std::string spellings[] = {"123456789012345678901234567890", "-0", "1E2", "2.540",
                                         "0.0000001"};
        for (const std::string& number : spellings) {
            CAPTURE(number);
            const std::string text = minimal(R"(, "future": )" + number +
                                             R"(, "parts": [{"ref": "R1", "kind": "resistor",
                                                 "pins": {"1": "A1", "2": "A5"},
                                                 "sizes": {"list": [1, )" +
                                             number + "]}}]");
            const std::string written = writeBoard(readOk(text));
            CHECK(written.find("\"future\": " + number + "\n") != std::string::npos);
            CHECK(written.find("          " + number + "\n") != std::string::npos);
            CHECK(writeBoard(readOk(written)) == written);
        }
    }

    SUBCASE("an unknown number changed after reading is written as its new value") {
        Board board = readOk(minimal(R"(, "future": 1E2, "other": 1E2)"));
        CHECK(board.extra["future"] == 100.0);  // still a number for whoever reads it
        board.extra["future"] = 3;
        const std::string written = writeBoard(board);
        CHECK(written.find("\"future\": 3,") != std::string::npos);
        CHECK(written.find("\"other\": 1E2\n") != std::string::npos);
    }

    SUBCASE("the key that keeps spellings cannot come from a file") {
        const ReadResult<Board> result = readBoard(minimal(R"(, "\u0000spellings": 1)"), "r.json");
        REQUIRE(result.error.has_value());
        CHECK(result.error->message == "this key is reserved");
    }

    SUBCASE("optional members take their defaults") {
        const Board board = readOk(minimal(""));
        CHECK(board.title.empty());
        CHECK(board.pitchMm == 2.54);  // 0.1 in (REFERENCE-FACTS: 1 in = 25.4 mm)
        CHECK(board.copper == CopperPattern::Strips);
        CHECK(board.parts.empty());
        CHECK_FALSE(board.circuit.has_value());
    }

    SUBCASE("copper-side links and pads boards") {
        const Board board = readOk(minimal(
            R"(, "links": [{"from": "A1", "to": "B1", "side": "copper"}, {"from": "A2", "to": "B2", "side": "component"}])",
            R"({"rows": 4, "cols": 6, "copper": "pads", "pitch_mm": 2.5})"));
        CHECK(board.copper == CopperPattern::Pads);
        CHECK(board.pitchMm == 2.5);
        CHECK(board.links[0].copperSide);
        CHECK_FALSE(board.links[1].copperSide);
        const std::string written = writeBoard(board);
        CHECK(written.find("\"side\": \"copper\"") != std::string::npos);
        CHECK(written.find("\"component\"") == std::string::npos);
        CHECK(readOk(written) == board);
    }

    SUBCASE("a file written by a newer version is refused, and says so") {
        const auto result = readBoard(R"({"format": "stripsmith-board", "version": 2,
            "board": {"rows": 1, "cols": 1}})",
                                      "new.board.json");
        REQUIRE_FALSE(result.ok());
        CHECK(result.error->newerVersion);
        CHECK(result.error->describe() ==
              "new.board.json:1:43: version: version 2 is newer than this program reads (1)");
    }
}

TEST_CASE("circuit file") {
    const std::string text =
        R"({"parts": {"Q1": {"kind": "bjt", "value": "BC547", "pins": ["C", "B", "E"]},
        "R1": {"kind": "resistor", "value": "10k"}},
        "nets": {"OUT": ["Q1.C", "R1.2"], "VCC": ["R1.1"]}, "note": "kept"})";
    const auto result = readCircuit(text, "amp.circuit.json");
    REQUIRE(result.ok());
    const Circuit& circuit = *result.value;
    CHECK(circuit.parts.at("Q1").pins == std::vector<std::string>{"C", "B", "E"});
    CHECK(circuit.netOf({"R1", "2"}) == "OUT");
    CHECK_FALSE(circuit.netOf({"Q1", "E"}).has_value());
    CHECK(circuit.extra == nlohmann::json{{"note", "kept"}});
    const auto again = readCircuit(writeCircuit(circuit), "again");
    REQUIRE(again.ok());
    CHECK(*again.value == circuit);

    SUBCASE("refs of flattened subcircuits may hold a '.'") {
        const auto flat = readCircuit(R"({"parts": {"X1.R1": {"kind": "resistor", "value": "1k"}},
            "nets": {"IN": ["X1.R1.1"]}})",
                                      "flat.circuit.json");
        REQUIRE(flat.ok());
        CHECK(flat.value->nets.at("IN") == std::vector<PinRef>{{"X1.R1", "1"}});
        CHECK(readCircuit(writeCircuit(*flat.value), "again").value == flat.value);
    }
}

TEST_CASE("board file samples") {
    const auto samples = test_support::sourceFiles("samples", ".board.json");
    SUBCASE("there are samples to read") {
        // The samples folder holds at least three circuits (guard against an empty data loop).
        CHECK(samples.size() >= 3);
    }
    SUBCASE("every sample reads and survives a round trip") {
        for (const std::string& file : samples) {
            CAPTURE(file);
            const auto first = readBoard(test_support::readTextFile(file), file);
            REQUIRE_MESSAGE(first.ok(), first.error->describe());
            const std::string written = writeBoard(*first.value);
            const auto second = readBoard(written, file);
            REQUIRE_MESSAGE(second.ok(), second.error->describe());
            CHECK(*second.value == *first.value);
            CHECK(writeBoard(*second.value) == written);
        }
    }
}

TEST_CASE("board file random round trips") {
    for (unsigned seed : {1u, 2u, 3u}) {
        CAPTURE(seed);
        std::mt19937 rng(seed);
        for (int i = 0; i < 1000; ++i) {
            const Board board = test_support::randomBoard(rng);
            const std::string written = writeBoard(board);
            const auto back = readBoard(written, "random.board.json");
            if (!back.ok()) {
                CAPTURE(written);
                FAIL(back.error->describe());
            }
            if (!(*back.value == board)) {
                CHECK(writeBoard(*back.value) == written);
                REQUIRE(*back.value == board);
            }
        }
    }
}

// Limits on absurd input: boards over 1,000 x 1,000 holes, files over 64 MiB, more than 100,000
// parts, JSON nested deeper than 64 levels, more than two million JSON values. Each gives a clear message naming the file, and each
// can be tightened or relaxed through ReadLimits. The big inputs are generated here.
#include <filesystem>
#include <fstream>
#include <random>
#include <string>

#include <doctest/doctest.h>

#include "netcheck/file/board_file.hpp"
#include "netcheck/file/file_io.hpp"

using namespace netcheck;

namespace {

constexpr std::string_view kFile = "big.board.json";

std::string grid(long long rows, long long cols) {
    return R"({"rows": )" + std::to_string(rows) + R"(, "cols": )" + std::to_string(cols) + "}";
}

// A valid board file with `body` (members after "board", each starting with a comma).
std::string boardText(const std::string& gridText, const std::string& body = "") {
    return R"({"format": "stripsmith-board", "version": 1, "board": )" + gridText + body + "}";
}

// `count` on-board parts, all in the same two holes (the file allows shared holes).
std::string partsMember(int count) {
    std::string text = R"(, "parts": [)";
    for (int i = 1; i <= count; ++i) {
        if (i > 1) text += ',';
        text += R"({"ref": "R)" + std::to_string(i) +
                R"(", "kind": "resistor", "value": "1k", "pins": {"1": "A1", "2": "A5"}})";
    }
    return text + "]";
}

// An unknown member holding arrays nested `depth` deep (the file itself adds one more level).
std::string nestedMember(int depth) {
    return R"(, "notes": )" + std::string(static_cast<std::size_t>(depth), '[') +
           std::string(static_cast<std::size_t>(depth), ']');
}

ReadResult<Board> read(const std::string& text, const ReadLimits& limits = {}) {
    return readBoard(text, kFile, limits);
}

std::string errorOf(const ReadResult<Board>& result) {
    REQUIRE_FALSE(result.ok());
    REQUIRE(result.error.has_value());
    return result.error->describe();
}

void requireOk(const ReadResult<Board>& result) {
    if (!result.ok()) FAIL(result.error->describe());
}

}  // namespace

TEST_CASE("limits") {
    const ReadLimits defaults;
    // The limits the reliability requirements name.
    CHECK(defaults.maxRows == 1000);
    CHECK(defaults.maxCols == 1000);
    CHECK(defaults.maxBytes == 64u * 1024u * 1024u);
    CHECK(defaults.maxParts == 100000u);
    CHECK(defaults.maxDepth == 64);
    CHECK(defaults.maxValues == 2000000u);

    SUBCASE("board size") {
        requireOk(read(boardText(grid(1000, 1000))));
        CHECK(errorOf(read(boardText(grid(1001, 10)))) ==
              "big.board.json:1:64: board.rows: rows 1001 is above the limit of 1000");
        CHECK(errorOf(read(boardText(grid(10, 1001)))) ==
              "big.board.json:1:76: board.cols: cols 1001 is above the limit of 1000");
        // Numbers far past int must not wrap around into a small board.
        CHECK(errorOf(read(boardText(grid(4294967297LL, 10)))).find("above the limit") !=
              std::string::npos);
        ReadLimits relaxed;
        relaxed.maxRows = 2000;
        requireOk(read(boardText(grid(1001, 10)), relaxed));
        ReadLimits tight;
        tight.maxCols = 24;
        requireOk(read(boardText(grid(10, 24)), tight));
        CHECK(errorOf(read(boardText(grid(10, 25)), tight)).find("cols 25 is above the limit of 24") !=
              std::string::npos);
    }

    SUBCASE("file size") {
        // One byte over 64 MiB is refused before any parsing; exactly 64 MiB is not refused for
        // its size (it is blank padding around an empty object, so the format is what fails).
        std::string text(defaults.maxBytes + 1, ' ');
        CHECK(errorOf(read(text)) ==
              "big.board.json: the file is 67108865 bytes, more than the limit of 67108864");
        text.resize(defaults.maxBytes);
        text.front() = '{';
        text.back() = '}';
        CHECK(errorOf(read(text)).find("limit") == std::string::npos);

        ReadLimits tight;
        tight.maxBytes = 100;
        const std::string small = boardText(grid(4, 6));
        REQUIRE(small.size() < 100);
        requireOk(read(small, tight));
        CHECK(errorOf(read(small + std::string(100 - small.size() + 1, '\n'), tight)) ==
              "big.board.json: the file is 101 bytes, more than the limit of 100");
        CHECK_FALSE(readCircuit(std::string(101, ' '), "c.json", tight).ok());
    }

    SUBCASE("a file on disk over the limit is refused without reading it") {
        const auto path = std::filesystem::temp_directory_path() /
                          ("stripsmith-limits-" + std::to_string(std::random_device()()) +
                           ".board.json");
        std::ofstream(path).put('{');
        std::filesystem::resize_file(path, defaults.maxBytes + 1);  // sparse: no disk used
        const auto result = readFileLimited(path.string(), defaults.maxBytes);
        std::filesystem::remove(path);
        REQUIRE(result.error.has_value());
        CHECK(result.error->describe() == path.string() +
                                              ": the file is 67108865 bytes, too large (the "
                                              "limit is 67108864 bytes)");
    }

    SUBCASE("part count") {
        const std::string tooMany = boardText(grid(10, 24), partsMember(100001));
        CHECK(errorOf(read(tooMany)).ends_with(": more than 100000 parts"));
        CHECK(errorOf(read(tooMany)).starts_with("big.board.json:"));
        ReadLimits relaxed;
        relaxed.maxParts = 200000;
        const auto result = read(tooMany, relaxed);
        requireOk(result);
        CHECK(result.value->parts.size() == 100001u);

        ReadLimits tight;
        tight.maxParts = 3;
        requireOk(read(boardText(grid(10, 24), partsMember(3)), tight));
        CHECK(errorOf(read(boardText(grid(10, 24), partsMember(4)), tight))
                  .ends_with("more than 3 parts"));
        // Off-board parts count too.
        const std::string mixed = boardText(
            grid(10, 24), partsMember(2) + R"(, "offboard": [{"ref": "J1", "kind": "jack",
            "value": "", "pins": ["T", "S"]}, {"ref": "J2", "kind": "jack", "value": "",
            "pins": ["T", "S"]}])");
        CHECK(errorOf(read(mixed, tight)).ends_with("more than 3 parts"));
        // And the parts of a circuit file.
        const std::string circuit = R"({"parts": {"A": {"kind": "resistor"}, "B": {"kind": "resistor"},
            "C": {"kind": "resistor"}, "D": {"kind": "resistor"}}, "nets": {}})";
        const auto circuitResult = readCircuit(circuit, "four.circuit.json", tight);
        REQUIRE(circuitResult.error.has_value());
        CHECK(circuitResult.error->describe().ends_with("more than 3 parts"));
        CHECK(readCircuit(circuit, "four.circuit.json").ok());
    }

    SUBCASE("nesting depth") {
        // The file's own object is level 1: 63 more levels are allowed, 64 are not.
        requireOk(read(boardText(grid(4, 6), nestedMember(63))));
        const std::string deep = boardText(grid(4, 6), nestedMember(64));
        const std::string message = errorOf(read(deep));
        CHECK(message.starts_with("big.board.json:1:"));
        CHECK(message.ends_with("nesting is deeper than 64 levels"));
        // Brackets inside strings are text, not nesting.
        requireOk(read(boardText(grid(4, 6), R"(, "title": ")" + std::string(500, '[') + "\"")));
        // A hostile file a million levels deep gets the same message, not a stack overflow.
        CHECK(errorOf(read(boardText(grid(4, 6), nestedMember(1000000))))
                  .ends_with("nesting is deeper than 64 levels"));
        ReadLimits relaxed;
        relaxed.maxDepth = 300;
        requireOk(read(deep, relaxed));
        ReadLimits tight;
        tight.maxDepth = 3;
        CHECK(errorOf(read(boardText(grid(4, 6), nestedMember(3)), tight))
                  .ends_with("nesting is deeper than 3 levels"));
        const auto circuit = readCircuit(R"({"parts": {}, "nets": {}, "x": [[[[]]]]})", "c.json",
                                         tight);
        REQUIRE(circuit.error.has_value());
        CHECK(circuit.error->describe().ends_with("nesting is deeper than 3 levels"));
    }

    SUBCASE("JSON values") {
        // boardText(grid(...)) holds six values: the file's object, "format", "version", the
        // "board" object, "rows" and "cols". The unknown member adds its array and three items.
        const std::string ten = boardText(grid(4, 6), R"(, "junk": [0, {}, "x"])");
        ReadLimits tight;
        tight.maxValues = 10;
        requireOk(read(ten, tight));
        tight.maxValues = 9;
        CHECK(errorOf(read(ten, tight)) ==
              "big.board.json:1:95: more than 9 JSON values, the limit (each object, array, "
              "string, number, true, false and null is one)");
        // Keys and empty arrays are not values; strings hold no values.
        tight.maxValues = 8;
        requireOk(read(boardText(grid(4, 6), R"(, "[]": [], "k": "[1, 2, {}]")"), tight));
        const auto circuit =
            readCircuit(R"({"parts": {}, "nets": {}, "x": [1, 2, 3, 4, 5, 6]})", "c.json", tight);
        REQUIRE(circuit.error.has_value());
        CHECK(circuit.error->describe().starts_with("c.json:1:45: more than 8 JSON values"));
    }

    SUBCASE("millions of tiny values inside the size limit are refused before parsing") {
        // 58 MB of "0," once took 1.5 GB and 60 MB of "{}," 3 GB: each is a value in memory.
        std::string zeros = R"(, "junk": [)";
        for (int i = 0; i < 29000000; ++i) zeros += "0,";
        zeros += "0]";
        const std::string text = boardText(grid(4, 6), zeros);
        REQUIRE(text.size() < defaults.maxBytes);
        const std::string message = errorOf(read(text));
        CHECK(message.starts_with("big.board.json:1:"));
        CHECK(message.find("more than 2000000 JSON values") != std::string::npos);
    }
}

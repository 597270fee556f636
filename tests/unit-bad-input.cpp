// Malformed board files: each must be refused with a message naming the file, the line and what
// is wrong. The table tests/bad-input/expected.tsv is shared with the CLI tests.
#include <doctest/doctest.h>

#include <algorithm>
#include <random>
#include <sstream>

#include "netcheck/file/board_file.hpp"
#include "test_support.hpp"

using namespace netcheck;

namespace {

struct BadInput {
    std::string file;
    int line = 0;
    std::string fragment;
};

// Rows of "file<TAB>line<TAB>message fragment"; '#' lines are comments.
std::vector<BadInput> readTable() {
    std::vector<BadInput> rows;
    std::istringstream table(
        test_support::readTextFile(test_support::sourcePath("tests/bad-input/expected.tsv")));
    std::string row;
    while (std::getline(table, row)) {
        if (row.empty() || row.front() == '#') continue;
        const std::size_t tab1 = row.find('\t');
        const std::size_t tab2 = row.find('\t', tab1 + 1);
        REQUIRE_MESSAGE(tab2 != std::string::npos, row);
        rows.push_back({row.substr(0, tab1), std::stoi(row.substr(tab1 + 1, tab2 - tab1 - 1)),
                        row.substr(tab2 + 1)});
    }
    return rows;
}

FileError refused(std::string_view text, const ReadLimits& limits = {}) {
    const ReadResult<Board> result = readBoard(text, "limits.board.json", limits);
    REQUIRE_FALSE(result.ok());
    return *result.error;
}

std::string boardWithParts(int count) {
    std::string parts;
    for (int i = 1; i <= count; ++i) {
        parts += std::string(i > 1 ? "," : "") + R"({"ref": "R)" + std::to_string(i) +
                 R"(", "kind": "resistor", "pins": {"1": "A1", "2": "A5"}})";
    }
    return R"({"format": "stripsmith-board", "version": 1, "board": {"rows": 2, "cols": 8},
               "parts": [)" +
           parts + "]}";
}

}  // namespace

TEST_CASE("bad input") {
    const std::vector<BadInput> table = readTable();

    SUBCASE("the table has enough cases") {
        CHECK(table.size() >= 30);
    }

    SUBCASE("every file is refused with its message and line") {
        for (const BadInput& row : table) {
            CAPTURE(row.file);
            const std::string text =
                test_support::readTextFile(test_support::sourcePath("tests/bad-input/" + row.file));
            const ReadResult<Board> result = readBoard(text, row.file);
            REQUIRE_FALSE(result.ok());
            CHECK_FALSE(result.value.has_value());  // never a half-read board
            const std::string message = result.error->describe();
            CAPTURE(message);
            CHECK(result.error->line == row.line);
            CHECK(message.starts_with(row.file + ":" + std::to_string(row.line) + ":"));
            CHECK(message.find(row.fragment) != std::string::npos);
        }
    }

    SUBCASE("only a newer version is marked as newer") {
        for (const BadInput& row : table) {
            CAPTURE(row.file);
            const auto result = readBoard(
                test_support::readTextFile(test_support::sourcePath("tests/bad-input/" + row.file)),
                row.file);
            REQUIRE_FALSE(result.ok());
            CHECK(result.error->newerVersion == (row.fragment.find("newer") != std::string::npos));
        }
    }

    SUBCASE("size limits") {
        const std::string fine = boardWithParts(3);
        REQUIRE(readBoard(fine, "fine.board.json").ok());

        ReadLimits fewParts;
        fewParts.maxParts = 2;
        const FileError parts = refused(fine, fewParts);
        CHECK(parts.path == "parts[2].ref");
        CHECK(parts.message == "more than 2 parts");

        ReadLimits fewBytes;
        fewBytes.maxBytes = 100;
        const FileError bytes = refused(fine, fewBytes);
        CHECK(bytes.message.find("more than the limit of 100") != std::string::npos);

        ReadLimits smallBoard;
        smallBoard.maxCols = 7;
        CHECK(refused(fine, smallBoard).message == "cols 8 is above the limit of 7");

        ReadLimits shallow;
        shallow.maxDepth = 3;
        const FileError deep = refused(fine, shallow);
        CHECK(deep.message == "nesting is deeper than 3 levels");
        CHECK(deep.line == 2);
    }

    SUBCASE("very deep nesting is refused before parsing") {
        // A million brackets would exhaust the stack of a recursive parser.
        const std::string text = std::string(1'000'000, '[') + std::string(1'000'000, ']');
        CHECK(refused(text).message == "nesting is deeper than 64 levels");
    }

    SUBCASE("syntax errors give line and column") {
        const FileError error =
            refused("{\n  \"format\": \"stripsmith-board\",\n  \"version\": 1,,\n}");
        CHECK(error.line == 3);
        CHECK(error.column == 16);  // the second comma
        CHECK(error.path.empty());
        CHECK(error.message.starts_with("JSON syntax error"));
    }

    SUBCASE("columns count characters, not bytes") {
        const FileError error =
            refused("{\"title\": \"Ωµ\", \"format\": \"x\", \"version\": 1, \"board\": {}}");
        CHECK(error.path == "format");
        CHECK(error.column == 27);  // two 2-byte characters before it count as two columns
    }

    SUBCASE("damaged files are refused or read whole, never half") {
        // Property test with fixed seeds: damage valid files byte by byte; whatever reads must
        // write back to a file that reads to the same board.
        const std::string_view alphabet = "{}[]\",:0123456789.|-aAZz \n\\";
        std::mt19937 rng(20261201);
        int refusedCount = 0;
        for (int i = 0; i < 3000; ++i) {
            std::string text = writeBoard(test_support::randomBoard(rng));
            const int damage = std::uniform_int_distribution<int>(1, 4)(rng);
            for (int d = 0; d < damage; ++d) {
                const auto at = std::uniform_int_distribution<std::size_t>(0, text.size() - 1)(rng);
                const char c = alphabet[std::uniform_int_distribution<std::size_t>(
                    0, alphabet.size() - 1)(rng)];
                switch (std::uniform_int_distribution<int>(0, 2)(rng)) {
                    case 0:
                        text[at] = c;
                        break;
                    case 1:
                        text.erase(at, 1);
                        break;
                    default:
                        text.insert(at, 1, c);
                        break;
                }
            }
            const auto result = readBoard(text, "damaged.board.json");
            if (!result.ok()) {
                ++refusedCount;
                CHECK(result.error->line >= 1);
                CHECK(result.error->line <= 1 + std::count(text.begin(), text.end(), '\n'));
                continue;
            }
            const auto again = readBoard(writeBoard(*result.value), "again.board.json");
            REQUIRE(again.ok());
            CHECK(*again.value == *result.value);
        }
        MESSAGE("refused " << refusedCount << " of 3000 damaged files");
        CHECK(refusedCount > 1000);  // the damage is real: most damaged files must be refused
    }

    SUBCASE("a byte order mark is read past and not counted as a column") {
        const std::string text = "\xEF\xBB\xBF{\"format\": 1}";
        const FileError error = refused(text);
        CHECK(error.path == "format");
        CHECK(error.line == 1);
        CHECK(error.column == 12);
    }

    SUBCASE("circuit files report like board files") {
        const auto result =
            readCircuit("{\n  \"nets\": {\n    \"A\": [\"R1.1\"],\n    \"B\": [\"R1.1\"]\n  }\n}",
                        "amp.circuit.json");
        REQUIRE_FALSE(result.ok());
        CHECK(result.error->describe() ==
              "amp.circuit.json:4:11: nets.B[0]: R1.1 is in nets A and B");
    }
}

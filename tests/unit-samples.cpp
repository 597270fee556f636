// Every sample board, checked: correct ones check clean, faulty ones give the findings written by
// hand into their "expect" key (worked out from the layout, not from the checker's output).
#include <doctest/doctest.h>

#include <algorithm>

#include "netcheck/file/board_file.hpp"
#include "netcheck/check/check.hpp"
#include "test_support.hpp"

using namespace netcheck;

namespace {

// Does `finding` match every field the expectation names?
bool matches(const Finding& finding, const nlohmann::json& expected) {
    if (finding.id() != expected.at("type").get<std::string>()) return false;
    if (expected.contains("ref") && finding.ref != expected["ref"].get<std::string>()) return false;
    if (expected.contains("net") && finding.net != expected["net"].get<std::string>()) return false;
    if (expected.contains("nets") && finding.nets != expected["nets"].get<std::vector<std::string>>()) {
        return false;
    }
    if (expected.contains("hole") && (!finding.hole || holeName(*finding.hole) != expected["hole"])) {
        return false;
    }
    if (expected.contains("fix") && finding.fix != expected["fix"].get<std::string>()) return false;
    if (expected.contains("cut")) {
        if (!finding.suggestedCut) return false;
        const auto allowed = expected["cut"].get<std::vector<std::string>>();
        if (std::find(allowed.begin(), allowed.end(), cutName(*finding.suggestedCut)) == allowed.end()) {
            return false;
        }
    }
    if (expected.contains("pieces")) {
        std::vector<std::vector<std::string>> pieces;
        for (const auto& piece : finding.pieces) {
            auto& names = pieces.emplace_back();
            for (const PinRef& pin : piece) names.push_back(pin.name());
        }
        if (pieces != expected["pieces"].get<std::vector<std::vector<std::string>>>()) return false;
    }
    return true;
}

// Each expected finding matches one finding, one to one, and nothing else is found.
void checkFindings(const std::vector<Finding>& found, const nlohmann::json& expected) {
    CHECK(found.size() == expected.size());
    std::vector<bool> used(found.size(), false);
    for (const auto& entry : expected) {
        CAPTURE(entry.dump());
        bool hit = false;
        for (std::size_t i = 0; i < found.size() && !hit; ++i) {
            if (!used[i] && matches(found[i], entry)) used[i] = hit = true;
        }
        CHECK(hit);
    }
}

}  // namespace

TEST_CASE("samples") {
    const std::vector<std::string> files = test_support::sourceFiles("samples", ".board.json");

    SUBCASE("the samples exist: three circuits, a demo, at least four planted faults") {
        CHECK(files.size() >= 8);
        int faulty = 0;
        for (const std::string& file : files) {
            faulty += file.find('-') != std::string::npos &&
                      file.find("demo") == std::string::npos;
        }
        CHECK(faulty >= 4);
    }

    SUBCASE("each sample reads, and checks as its expect key says") {
        for (const std::string& file : files) {
            CAPTURE(file);
            const ReadResult<Board> read = readBoard(test_support::readTextFile(file), file);
            REQUIRE_MESSAGE(read.ok(), (read.error ? read.error->describe() : ""));
            const Board& board = *read.value;
            REQUIRE(board.circuit);
            REQUIRE(board.extra.contains("expect"));
            const nlohmann::json& expect = board.extra["expect"];
            const CheckReport report = test_support::checkWithFixes(board);
            CHECK(report.ok() == (expect.at("exit").get<int>() == 0));
            checkFindings(report.errors, expect.at("errors"));
            if (expect.contains("warnings")) checkFindings(report.warnings, expect["warnings"]);
        }
    }
}

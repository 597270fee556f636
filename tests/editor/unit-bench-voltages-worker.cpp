// The editor's bench-voltage worker: results arrive off the calling thread, carry the revision
// they were asked for, and a burst of requests ends with the last one's result.
#include <doctest/doctest.h>

#include <fstream>
#include <sstream>

#include "editor/app/bench_voltages_worker.hpp"
#include "netcheck/file/board_file.hpp"

using namespace stripsmith;

namespace {

netcheck::Board sample(const std::string& name) {
    const std::string path = std::string(STRIPSMITH_SOURCE) + "/samples/" + name;
    std::ifstream in(path);
    std::stringstream text;
    text << in.rdbuf();
    auto board = netcheck::readBoard(text.str(), path);
    REQUIRE(board.ok());
    return *board.value;
}

double volts(const netcheck::BenchVoltages& voltages, const std::string& net) {
    for (const auto& reading : voltages.nets) {
        if (reading.net == net) return reading.nominal;
    }
    FAIL("no net " << net);
    return 0;
}

}  // namespace

TEST_CASE("bench voltages worker") {
    BenchVoltagesWorker worker;
    CHECK(worker.latest() == nullptr);
    netcheck::Board board = sample("astable.board.json");
    worker.request(board, 1);
    worker.waitIdle();
    auto first = worker.latest();
    REQUIRE(first);
    CHECK(first->revision == 1);
    REQUIRE(first->voltages.value);
    CHECK(volts(*first->voltages.value, "VCC") == doctest::Approx(9.0));

    // Three quick edits of the circuit's battery (6, 9, 12 V): the last result is the last one's.
    REQUIRE(board.circuit);
    for (unsigned revision = 2; revision <= 4; ++revision) {
        board.circuit->parts["BT1"].value = std::to_string(revision * 3) + "V";
        worker.request(board, revision);
    }
    worker.waitIdle();
    CHECK_FALSE(worker.busy());
    auto last = worker.latest();
    REQUIRE(last);
    CHECK(last->revision == 4);
    REQUIRE(last->voltages.value);
    CHECK(volts(*last->voltages.value, "VCC") == doctest::Approx(12.0));
}

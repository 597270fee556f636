// The editor's layout worker: runs off the calling thread, gives distinct alternatives best first,
// the same ones for the same seed and budget, and Cancel ends a long run at once with nothing.
#include <doctest/doctest.h>

#include <chrono>
#include <thread>

#include "editor/app/layout_worker.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/file/board_file.hpp"
#include "../test_support.hpp"

using namespace stripsmith;

namespace {

LayoutRequest astable(long iterations) {
    const std::string path = test_support::sourcePath("samples/astable.board.json");
    auto board = netcheck::readBoard(test_support::readTextFile(path), path);
    REQUIRE(board.ok());
    LayoutRequest request;
    request.circuit = *board.value->circuit;
    request.options.iterations = iterations;
    return request;
}

std::vector<netcheck::LayoutResult> finished(LayoutWorker& worker) {
    worker.waitIdle();
    const LayoutStatus status = worker.status();
    CHECK_FALSE(status.running);
    CHECK(status.finished);
    return worker.takeResults();
}

}  // namespace

TEST_CASE("layout worker: alternatives, best first, the same for the same seed") {
    LayoutWorker worker;
    worker.start(astable(80));
    const auto first = finished(worker);
    REQUIRE_FALSE(first.empty());
    CHECK(first.size() <= 3);
    for (std::size_t i = 0; i < first.size(); ++i) {
        CHECK(netcheck::check(first[i].board).ok());
        if (i > 0) {
            CHECK(first[i - 1].score.key() <= first[i].score.key());
            CHECK_FALSE(first[i - 1].board == first[i].board);
        }
    }
    worker.start(astable(80));
    const auto again = finished(worker);
    REQUIRE(again.size() == first.size());
    for (std::size_t i = 0; i < first.size(); ++i) CHECK(again[i].board == first[i].board);
}

TEST_CASE("layout worker: Cancel ends a long run at once, with no results") {
    LayoutWorker worker;
    worker.start(astable(100'000'000));  // hours of work
    const auto started = std::chrono::steady_clock::now();
    while (worker.status().fraction <= 0 &&
           std::chrono::steady_clock::now() - started < std::chrono::seconds(20)) {
        std::this_thread::yield();  // the run is under way once it reports progress
    }
    CHECK(worker.status().running);
    worker.cancel();
    const double seconds =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - started).count();
    CHECK(seconds < 20);
    const LayoutStatus status = worker.status();
    CHECK_FALSE(status.running);
    CHECK_FALSE(status.finished);
    CHECK(worker.takeResults().empty());
}

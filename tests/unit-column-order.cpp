// Column ordering (netcheck/layout/column_order) against the published best known values of the
// 2005 Constraint Modelling Challenge open-stacks instances in tests/layout-bench/ (the
// `objective` and order `s` of each .sol file; see that folder's README for the source).
#include <doctest/doctest.h>

#include <algorithm>
#include <numeric>
#include <random>

#include "layout_bench_file.hpp"
#include "netcheck/layout/column_order.hpp"
#include "test_support.hpp"

namespace {

struct Instance {
    netcheck::ColumnProblem problem;
    int bestKnown = 0;
    std::vector<int> bestOrder;  // 0-based
};

Instance loadInstance(const std::string& name) {
    const std::string folder = "tests/layout-bench/";
    std::string problem;
    const auto instance = layout_bench::readInstance(
        test_support::readTextFile(test_support::sourcePath(folder + name + ".dzn")), problem);
    REQUIRE_MESSAGE(instance, problem);
    const auto solution = layout_bench::readItems(
        test_support::readTextFile(test_support::sourcePath(folder + name + ".sol")), problem);
    REQUIRE_MESSAGE(solution, problem);
    Instance result{*instance, static_cast<int>(solution->at("objective").at(0)), {}};
    for (long product : solution->at("s")) result.bestOrder.push_back(static_cast<int>(product - 1));
    return result;
}

bool isPermutation(std::vector<int> order, int size) {
    std::sort(order.begin(), order.end());
    std::vector<int> identity(static_cast<std::size_t>(size));
    std::iota(identity.begin(), identity.end(), 0);
    return order == identity;
}

// The strips of an order counted the plain way: for each column, the nets whose first and last
// columns lie on either side of it.
int stripsByHand(const netcheck::ColumnProblem& problem, const std::vector<int>& order) {
    int most = 0;
    for (std::size_t at = 0; at < order.size(); ++at) {
        int open = 0;
        for (int net = 0; net < problem.nets; ++net) {
            bool before = false;
            bool after = false;
            for (std::size_t i = 0; i < order.size(); ++i) {
                const auto& nets = problem.columnNets[static_cast<std::size_t>(order[i])];
                if (std::find(nets.begin(), nets.end(), net) == nets.end()) continue;
                before = before || i <= at;
                after = after || i >= at;
            }
            open += before && after ? 1 : 0;
        }
        most = std::max(most, open);
    }
    return most;
}

}  // namespace

TEST_CASE("column order") {
    SUBCASE("openStrips gives the published value for the published order") {
        // tests/layout-bench/*.sol: objective and s, from the MiniZinc benchmarks collection.
        for (const char* name : {"tiny", "problem_15_15_1", "Miller19", "wbop_15_30_1"}) {
            CAPTURE(name);
            const Instance instance = loadInstance(name);
            REQUIRE(isPermutation(instance.bestOrder, instance.problem.columns()));
            CHECK(netcheck::openStrips(instance.problem, instance.bestOrder) == instance.bestKnown);
        }
    }

    SUBCASE("openStrips agrees with counting by hand on random orders") {
        const Instance instance = loadInstance("problem_15_15_1");
        std::mt19937_64 random(7);
        std::vector<int> order(static_cast<std::size_t>(instance.problem.columns()));
        std::iota(order.begin(), order.end(), 0);
        for (int trial = 0; trial < 20; ++trial) {
            std::shuffle(order.begin(), order.end(), random);
            CHECK(netcheck::openStrips(instance.problem, order) ==
                  stripsByHand(instance.problem, order));
        }
    }

    SUBCASE("identity order as the bench README gives it") {
        // tests/layout-bench/README.md (from the shared bench notes): identity order needs
        // tiny 5, problem_15_15_1 10.
        for (const auto& [name, strips] : {std::pair{"tiny", 5}, std::pair{"problem_15_15_1", 10}}) {
            const Instance instance = loadInstance(name);
            std::vector<int> order(static_cast<std::size_t>(instance.problem.columns()));
            std::iota(order.begin(), order.end(), 0);
            CHECK(netcheck::openStrips(instance.problem, order) == strips);
        }
    }

    SUBCASE("orderColumns reaches the best known value within a fixed iteration budget") {
        for (const char* name : {"tiny", "problem_15_15_1"}) {
            CAPTURE(name);
            const Instance instance = loadInstance(name);
            netcheck::OrderOptions options;
            options.seed = 1;
            options.iterations = 200000;
            const netcheck::OrderResult result = netcheck::orderColumns(instance.problem, options);
            REQUIRE(isPermutation(result.order, instance.problem.columns()));
            CHECK(result.strips == netcheck::openStrips(instance.problem, result.order));
            CHECK(result.strips == instance.bestKnown);
        }
    }

    SUBCASE("the same seed gives the same order; the stop flag ends the search") {
        const Instance instance = loadInstance("Miller19");
        netcheck::OrderOptions options;
        options.iterations = 20000;
        const auto first = netcheck::orderColumns(instance.problem, options);
        const auto second = netcheck::orderColumns(instance.problem, options);
        CHECK(first.order == second.order);
        int calls = 0;
        options.stop = [&] { return ++calls >= 3; };
        long lastSeen = 0;
        options.progress = [&](const netcheck::OrderProgress& p) { lastSeen = p.iteration; };
        const auto stopped = netcheck::orderColumns(instance.problem, options);
        CHECK(stopped.iterationsUsed == 3 * 256);
        CHECK(lastSeen == 3 * 256);
        CHECK(isPermutation(stopped.order, instance.problem.columns()));
        CHECK(stopped.strips == netcheck::openStrips(instance.problem, stopped.order));
    }

    SUBCASE("the lower bound is the most nets of one column") {
        const Instance instance = loadInstance("tiny");
        // tiny.dzn: no product is ordered by more than two customers (product 1: customers 1
        // and 2), so the bound is 2, below the best known 3.
        CHECK(netcheck::stripLowerBound(instance.problem) == 2);
    }
}

// Connectivity tracing, checked against Boost.Graph's connected_components on the same hole graph
// (an independent reference implementation), plus a few hand-worked boards.
#include <doctest/doctest.h>

#include <boost/graph/adjacency_list.hpp>
#include <boost/graph/connected_components.hpp>

#include <algorithm>
#include <map>
#include <random>
#include <set>

#include "netcheck/check/circuit_capture.hpp"
#include "netcheck/check/connectivity.hpp"
#include "test_support.hpp"

using namespace netcheck;

namespace {

using Graph = boost::adjacency_list<boost::vecS, boost::vecS, boost::undirectedS>;

int holeNode(const Board& board, Hole hole) { return hole.row * board.cols + hole.col; }

// Node of a wire end, written from the file rules: a hole, or a lug of an off-board part
// (lugs numbered after the holes in board order).
int endNode(const Board& board, const Endpoint& end) {
    if (end.isHole()) return holeNode(board, *end.hole);
    int node = board.holeCount();
    for (const OffboardPart& part : board.offboard) {
        for (const std::string& pin : part.pins) {
            if (part.ref == end.lug.ref && pin == end.lug.pin) return node;
            ++node;
        }
    }
    return -1;
}

// The hole graph built edge by edge, straight from the copper rules.
Graph referenceGraph(const Board& board) {
    int lugs = 0;
    for (const OffboardPart& part : board.offboard) lugs += static_cast<int>(part.pins.size());
    Graph graph(static_cast<std::size_t>(board.holeCount() + lugs));
    if (board.copper == CopperPattern::Strips) {
        std::set<Hole> holeCuts;
        std::set<Hole> betweenCuts;
        for (const Cut& cut : board.cuts) {
            (cut.kind == Cut::Kind::Hole ? holeCuts : betweenCuts).insert(cut.hole);
        }
        for (int r = 0; r < board.rows; ++r) {
            for (int c = 0; c + 1 < board.cols; ++c) {
                const Hole a{r, c};
                const Hole b{r, c + 1};
                if (holeCuts.count(a) || holeCuts.count(b) || betweenCuts.count(a)) continue;
                boost::add_edge(holeNode(board, a), holeNode(board, b), graph);
            }
        }
    }
    for (const Link& link : board.links) {
        boost::add_edge(holeNode(board, link.from), holeNode(board, link.to), graph);
    }
    for (const Wire& wire : board.wires) {
        const int a = endNode(board, wire.from);
        const int b = endNode(board, wire.to);
        if (a >= 0 && b >= 0) boost::add_edge(a, b, graph);
    }
    return graph;
}

// A partition as a set of node sets, so island numbering does not matter.
std::set<std::set<int>> partition(const std::vector<int>& componentOfNode) {
    std::map<int, std::set<int>> groups;
    for (std::size_t node = 0; node < componentOfNode.size(); ++node) {
        groups[componentOfNode[node]].insert(static_cast<int>(node));
    }
    std::set<std::set<int>> result;
    for (auto& [id, nodes] : groups) result.insert(std::move(nodes));
    return result;
}

std::vector<int> boostComponents(const Board& board) {
    const Graph graph = referenceGraph(board);
    std::vector<int> component(boost::num_vertices(graph));
    boost::connected_components(graph, component.data());
    return component;
}

std::vector<int> tracedIslands(const Board& board) {
    const Connectivity copper(board);
    std::vector<int> island(static_cast<std::size_t>(copper.nodeCount()));
    for (int node = 0; node < copper.nodeCount(); ++node) {
        island[static_cast<std::size_t>(node)] = copper.islandOfNode(node);
    }
    return island;
}

Board stripBoard(int rows, int cols) {
    Board board;
    board.rows = rows;
    board.cols = cols;
    return board;
}

}  // namespace

TEST_CASE("connectivity") {
    SUBCASE("random boards agree with Boost.Graph connected_components") {
        std::mt19937 rng(20261201);  // fixed seed: the same 3000 boards every run
        for (int i = 0; i < 3000; ++i) {
            const Board board = test_support::randomBoard(rng);
            CAPTURE(i);
            CAPTURE(board.rows);
            CAPTURE(board.cols);
            const std::vector<int> ours = tracedIslands(board);
            const std::vector<int> reference = boostComponents(board);
            REQUIRE(ours.size() == reference.size());
            CHECK(partition(ours) == partition(reference));
            const Connectivity copper(board);
            std::set<int> ids(ours.begin(), ours.end());
            CHECK(static_cast<int>(ids.size()) == copper.islandCount());
        }
    }

    SUBCASE("dense cuts and links agree with Boost.Graph too") {
        std::mt19937 rng(7);
        test_support::RandomBoardOptions options;
        options.cutsPerHole = 0.3;
        options.linksPerHole = 0.1;
        options.padsChance = 0.0;
        for (int i = 0; i < 1000; ++i) {
            const Board board = test_support::randomBoard(rng, options);
            CAPTURE(i);
            CHECK(partition(tracedIslands(board)) == partition(boostComponents(board)));
        }
    }

    SUBCASE("one island's holes and pins are those of its Boost.Graph component") {
        std::mt19937 rng(20261202);  // fixed seed
        for (int i = 0; i < 500; ++i) {
            const Board board = test_support::randomBoard(rng);
            if (board.parts.empty()) continue;
            CAPTURE(i);
            const std::vector<int> reference = boostComponents(board);
            const Connectivity copper(board);
            const Hole probe = board.parts.front().pins.front().hole;
            const int component = reference[static_cast<std::size_t>(holeNode(board, probe))];
            std::vector<Hole> holes;
            for (int node = 0; node < board.holeCount(); ++node) {
                if (reference[static_cast<std::size_t>(node)] == component)
                    holes.push_back(Hole{node / board.cols, node % board.cols});
            }
            std::vector<PinRef> pins;
            for (const Part& part : board.parts) {
                for (const Pin& pin : part.pins) {
                    if (reference[static_cast<std::size_t>(holeNode(board, pin.hole))] == component)
                        pins.push_back(PinRef{part.ref, pin.name});
                }
            }
            for (const OffboardPart& part : board.offboard) {
                for (const std::string& lug : part.pins) {
                    const int node = endNode(board, Endpoint::atLug({part.ref, lug}));
                    if (reference[static_cast<std::size_t>(node)] == component)
                        pins.push_back(PinRef{part.ref, lug});
                }
            }
            std::sort(pins.begin(), pins.end());
            const Island island = copper.island(copper.islandOfHole(probe));
            CHECK(island.holes == holes);
            CHECK(island.pins == pins);
        }
        CHECK(Connectivity(stripBoard(2, 2)).island(2).holes.empty());  // ids run 0..1
    }

    SUBCASE("a strip is one island until cut") {
        Board board = stripBoard(2, 6);
        const Connectivity whole(board);
        CHECK(whole.islandCount() == 2);
        CHECK(whole.islandOfHole({0, 0}) == whole.islandOfHole({0, 5}));
        board.cuts.push_back(Cut{{0, 2}, Cut::Kind::Between});  // A3|A4
        const Connectivity cut(board);
        CHECK(cut.islandCount() == 3);
        CHECK(cut.islandOfHole({0, 2}) != cut.islandOfHole({0, 3}));
        CHECK_FALSE(cut.joinsNext({0, 2}));
        CHECK(cut.joinsNext({0, 1}));
    }

    SUBCASE("a hole cut isolates its hole, but a lead in it still joins a link") {
        Board board = stripBoard(2, 5);
        board.cuts.push_back(Cut{{0, 2}, Cut::Kind::Hole});  // A3
        board.links.push_back(Link{{0, 2}, {1, 2}});          // A3 to B3
        const Connectivity copper(board);
        CHECK(copper.isHoleCut({0, 2}));
        CHECK(copper.islandOfHole({0, 1}) != copper.islandOfHole({0, 3}));
        CHECK(copper.islandOfHole({0, 2}) == copper.islandOfHole({1, 0}));
        CHECK(copper.islandOfHole({0, 1}) != copper.islandOfHole({0, 2}));
        CHECK(copper.islandCount() == 3);  // A1-A2, A3 + strip B, A4-A5
    }

    SUBCASE("pad board: no two holes share copper") {
        Board board = stripBoard(3, 3);
        board.copper = CopperPattern::Pads;
        CHECK(Connectivity(board).islandCount() == 9);
    }

    SUBCASE("off-board lugs join through wires; pins are found by name") {
        Board board = stripBoard(2, 4);
        board.parts.push_back(Part{"R1", "resistor", "1k", {{"1", {0, 0}}, {"2", {1, 0}}}, {}});
        board.offboard.push_back(OffboardPart{"VR1", "pot", "B10k", {"1", "2", "3"}, {}});
        board.wires.push_back(Wire{Endpoint::atLug({"VR1", "2"}), Endpoint::atHole({1, 3}), "", {}});
        const Connectivity copper(board);
        CHECK(copper.islandOfPin({"VR1", "2"}) == copper.islandOfPin({"R1", "2"}));
        CHECK(copper.islandOfPin({"VR1", "1"}) != copper.islandOfPin({"VR1", "3"}));
        CHECK(copper.islandOfPin({"R9", "1"}) == -1);
        const auto nets = boardNets(board);
        const std::vector<std::vector<PinRef>> expected{
            {{"R1", "1"}}, {{"R1", "2"}, {"VR1", "2"}}, {{"VR1", "1"}}, {{"VR1", "3"}}};
        CHECK(nets == expected);
    }
}

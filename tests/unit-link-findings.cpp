// Bare links lying across leads and across each other: hand-worked boards, then random boards
// against Boost.Geometry's segment intersection and point-to-segment distance (an independent
// reference implementation of the geometry).
#include <doctest/doctest.h>

#define BOOST_ALLOW_DEPRECATED_HEADERS  // Boost 1.74's geometry pulls in a deprecated header
#include <boost/geometry.hpp>
#include <boost/geometry/geometries/point_xy.hpp>
#include <boost/geometry/geometries/segment.hpp>

#include <algorithm>
#include <random>

#include "netcheck/check/check.hpp"
#include "netcheck/check/checked_board.hpp"
#include "netcheck/model/link_geometry.hpp"
#include "test_support.hpp"

using namespace netcheck;

namespace {

namespace bg = boost::geometry;
using Point = bg::model::d2::point_xy<double>;
using Segment = bg::model::segment<Point>;

Hole h(const char* name) { return *parseHole(name); }

Board emptyBoard(int rows, int cols) {
    Board board;
    board.rows = rows;
    board.cols = cols;
    return board;
}

void addPin(Board& board, const std::string& ref, Hole hole) {
    board.parts.push_back(Part{ref, "test-point", "", {{"1", hole}}, {}});
}

std::vector<Finding> linkWarnings(const Board& board) {
    std::vector<Finding> found;
    for (const Finding& finding : check(board).warnings) {
        if (finding.id() == "link-over-lead" || finding.id() == "links-touch") found.push_back(finding);
    }
    return found;
}

Point centre(Hole hole) { return Point{double(hole.col), double(hole.row)}; }
Segment wire(const Link& link) { return Segment{centre(link.from), centre(link.to)}; }

}  // namespace

TEST_CASE("bare links") {
    SUBCASE("a bare link over a lead, and the same link sleeved or on the copper side") {
        Board board = emptyBoard(6, 10);
        board.parts.push_back(Part{"R1", "resistor", "1k", {{"1", h("C3")}, {"2", h("C7")}}, {}});
        board.links.push_back(Link{h("A3"), h("E3")});
        auto found = linkWarnings(board);
        REQUIRE(found.size() == 1);
        CHECK(found[0].id() == "link-over-lead");
        CHECK(found[0].holes == std::vector<Hole>{h("A3"), h("E3"), h("C3")});
        CHECK(found[0].message == "Bare link A3-E3 passes over C3 (R1.1): the wire would touch that lead");
        CHECK(found[0].fix == "sleeve the link or route it round");
        board.links[0].insulated = true;
        CHECK(linkWarnings(board).empty());
        board.links[0].insulated = false;
        board.links[0].copperSide = true;
        CHECK(linkWarnings(board).empty());
    }

    SUBCASE("leads passed over are listed with a final \"and\"; past eight, the rest are counted") {
        Board board = emptyBoard(3, 14);
        board.links.push_back(Link{h("B1"), h("B4")});
        addPin(board, "TP1", h("B2"));
        addPin(board, "TP2", h("B3"));
        auto found = linkWarnings(board);
        REQUIRE(found.size() == 1);
        CHECK(found[0].message ==
              "Bare link B1-B4 passes over B2 (TP1.1) and B3 (TP2.1): the wire would touch those leads");
        board = emptyBoard(3, 14);
        board.links.push_back(Link{h("B1"), h("B12")});
        for (int col = 2; col <= 11; ++col) addPin(board, "TP" + std::to_string(col), Hole{1, col - 1});
        found = linkWarnings(board);
        REQUIRE(found.size() == 1);
        CHECK(found[0].message ==
              "Bare link B1-B12 passes over B2 (TP2.1), B3 (TP3.1), B4 (TP4.1), B5 (TP5.1), B6 (TP6.1), "
              "B7 (TP7.1), B8 (TP8.1) and 3 more holes: the wire would touch those leads");
        CHECK(found[0].holes.size() == 2 + 10);
    }

    SUBCASE("crossing at a hole, and crossing between holes") {
        Board board = emptyBoard(6, 10);
        board.links.push_back(Link{h("A3"), h("E3")});
        board.links.push_back(Link{h("D1"), h("D6")});
        board.links.push_back(Link{h("A8"), h("F10")});
        board.links.push_back(Link{h("A10"), h("F8")});
        auto found = linkWarnings(board);
        REQUIRE(found.size() == 2);
        CHECK(found[0].message == "Bare links A3-E3 and D1-D6 cross at D3: the wires would touch");
        CHECK(found[0].holes == std::vector<Hole>{h("A3"), h("E3"), h("D1"), h("D6")});
        // Rows 1 and 6 (A, F) meet half way, at row 3.5: between C9 and D9.
        CHECK(found[1].message == "Bare links A8-F10 and A10-F8 cross near D9: the wires would touch");
        board.links[1].insulated = true;
        CHECK(linkWarnings(board).size() == 1);
    }

    SUBCASE("an end on another link is a lead under it, not a crossing; neighbours do not touch") {
        Board board = emptyBoard(8, 8);
        board.links.push_back(Link{h("A3"), h("E3")});
        board.links.push_back(Link{h("C1"), h("C3")});  // ends on the first link's wire
        board.links.push_back(Link{h("A5"), h("E5")});
        board.links.push_back(Link{h("A6"), h("E6")});  // beside the one before: 2.54 mm apart
        auto found = linkWarnings(board);
        REQUIRE(found.size() == 1);
        CHECK(found[0].message == "Bare link A3-E3 passes over C3 (link C1-C3): the wire would touch that lead");
    }

    SUBCASE("how near is too near depends on the pitch") {
        // A1 to C2 passes 1/sqrt(5) = 0.447 pitches from B1 and from B2: 1.14 mm on a 2.54 mm
        // board (clear of a lead), 0.57 mm on a 1.27 mm board (touching; 0.6 mm is the limit).
        Board board = emptyBoard(4, 4);
        board.links.push_back(Link{h("A1"), h("C2")});
        addPin(board, "TP1", h("B1"));
        CHECK(linkWarnings(board).empty());
        board.pitchMm = 1.27;
        auto found = linkWarnings(board);
        REQUIRE(found.size() == 1);
        CHECK(found[0].holes == std::vector<Hole>{h("A1"), h("C2"), h("B1")});
    }

    SUBCASE("a suggested link for an open goes round a lead it would otherwise lie across") {
        // TP1 on strip A and TP2 on strip C are one net; the nearest free pair, A1 and C1, would
        // put a link across TP3's lead in B1, so the link goes through A3 and C3.
        Board board = emptyBoard(3, 10);
        addPin(board, "TP1", h("A2"));
        addPin(board, "TP2", h("C2"));
        addPin(board, "TP3", h("B1"));
        Circuit circuit;
        for (const char* ref : {"TP1", "TP2", "TP3"}) circuit.parts[ref] = {"test-point", "", {}, {}};
        circuit.nets["N"] = {{"TP1", "1"}, {"TP2", "1"}};
        const CheckReport report = test_support::checkWithFixes(board, &circuit);
        REQUIRE(report.errors.size() == 1);
        REQUIRE(report.errors[0].suggestedLinks.size() == 1);
        CHECK(report.errors[0].suggestedLinks[0].from == h("A3"));
        CHECK(report.errors[0].suggestedLinks[0].to == h("C3"));
    }

    SUBCASE("past a bound on the holes passed over, one warning says the links went unchecked") {
        // 300 bare links the height of a 30 x 30 board pass over 300 x 28 = 8,400 holes: more
        // than the 4 per hole plus 4,096 (7,696) that a check spends on link contacts.
        Board board = emptyBoard(30, 30);
        for (int i = 0; i < 300; ++i) board.links.push_back(Link{{0, i % 30}, {29, i % 30}});
        addPin(board, "TP1", h("P1"));  // under the links of column 1
        CHECK(linkWarnings(board).empty());
        const auto warnings = check(board).warnings;
        const auto unchecked = std::count_if(warnings.begin(), warnings.end(),
                                             [](const Finding& f) { return f.id() == "links-unchecked"; });
        CHECK(unchecked == 1);
        board.links.resize(250);  // 7,000 holes: within the bound, so TP1 is found under them
        CHECK_FALSE(linkWarnings(board).empty());
    }

    SUBCASE("random boards agree with Boost.Geometry") {
        std::mt19937 rng(20261202);  // fixed seed: the same 2000 boards every run
        int overLeads = 0;
        int crossings = 0;
        for (int round = 0; round < 2000; ++round) {
            auto uniform = [&](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng); };
            Board board = emptyBoard(uniform(2, 14), uniform(2, 14));
            board.pitchMm = uniform(0, 3) == 0 ? 1.27 : 2.54;
            auto anyHole = [&] { return Hole{uniform(0, board.rows - 1), uniform(0, board.cols - 1)}; };
            for (int p = uniform(0, 12); p > 0; --p) addPin(board, "TP" + std::to_string(p), anyHole());
            for (int l = uniform(0, 8); l > 0; --l) {
                Link link{anyHole(), anyHole()};
                if (link.from == link.to) continue;
                link.insulated = uniform(0, 5) == 0;
                link.copperSide = uniform(0, 7) == 0;
                board.links.push_back(link);
            }
            CAPTURE(round);
            // The reference: every lead, and every pair of bare wires, tested directly.
            const double reach = std::min(kLinkContactMm / board.pitchMm, 0.5);
            std::vector<Hole> leads;
            for (const Part& part : board.parts) leads.push_back(part.pins[0].hole);
            for (const Link& link : board.links) leads.insert(leads.end(), {link.from, link.to});
            std::sort(leads.begin(), leads.end());
            leads.erase(std::unique(leads.begin(), leads.end()), leads.end());
            std::vector<std::size_t> bare;
            for (std::size_t l = 0; l < board.links.size(); ++l) {
                if (!board.links[l].insulated && !board.links[l].copperSide) bare.push_back(l);
            }
            std::vector<std::vector<Hole>> expected;
            for (std::size_t l : bare) {
                const Link& link = board.links[l];
                std::vector<Hole> holes{link.from, link.to};
                for (const Hole& lead : leads) {
                    if (lead != link.from && lead != link.to && bg::distance(centre(lead), wire(link)) < reach)
                        holes.push_back(lead);
                }
                if (holes.size() > 2) expected.push_back(holes);
            }
            overLeads += static_cast<int>(expected.size());
            for (std::size_t i = 0; i < bare.size(); ++i) {
                for (std::size_t j = i + 1; j < bare.size(); ++j) {
                    const Link& a = board.links[bare[i]];
                    const Link& b = board.links[bare[j]];
                    const bool endOnOther = bg::intersects(centre(a.from), wire(b)) ||
                                            bg::intersects(centre(a.to), wire(b)) ||
                                            bg::intersects(centre(b.from), wire(a)) ||
                                            bg::intersects(centre(b.to), wire(a));
                    if (bg::intersects(wire(a), wire(b)) && !endOnOther) {
                        expected.push_back({a.from, a.to, b.from, b.to});
                        ++crossings;
                    }
                }
            }
            std::vector<std::vector<Hole>> ours;
            for (const Finding& finding : linkWarnings(board)) ours.push_back(finding.holes);
            CHECK(ours == expected);
        }
        // The boards exercise both findings (counts from this seed).
        CHECK(overLeads > 300);
        CHECK(crossings > 300);
    }
}

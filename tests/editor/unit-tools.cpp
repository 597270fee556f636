// Tool logic without a window: part making, rotation, pinouts, ref numbering, paste, fixes.
#include <doctest/doctest.h>

#include "editor/tools/edit_actions.hpp"
#include "editor/app/finding_fix.hpp"
#include "netcheck/check/circuit_capture.hpp"
#include "editor/tools/hit_test.hpp"
#include "editor/tools/part_factory.hpp"
#include "editor/tools/ref_names.hpp"
#include "netcheck/check/connectivity.hpp"

using namespace stripsmith;
using netcheck::Hole;

TEST_CASE("ref numbering") {
    netcheck::Board board;
    SUBCASE("prefixes by kind (common practice)") {
        CHECK(refPrefix("resistor") == "R");
        CHECK(refPrefix("electrolytic") == "C");
        CHECK(refPrefix("bjt") == "Q");
        CHECK(refPrefix("ic") == "U");
        CHECK(refPrefix("pot") == "VR");
        // The kind table's rule: an LED is named as the diode it is (the issue: it was LED1).
        CHECK(refPrefix("led") == "D");
        CHECK(refPrefix("panel-led") == "D");
        CHECK(refPrefix("no-such-kind") == "X");
        CHECK(prefixOf("VR12") == "VR");
    }
    SUBCASE("the lowest free number, counting off-board parts and gaps") {
        CHECK(nextFreeRef(board, "R") == "R1");
        board.parts.push_back(makeTwoLeadPart("resistor", "R1", "10k", {0, 0}, {0, 4}));
        board.parts.push_back(makeTwoLeadPart("resistor", "R3", "10k", {1, 0}, {1, 4}));
        CHECK(nextFreeRef(board, "R") == "R2");
        board.offboard.push_back({"R2", "pot", "", {"1", "2", "3"}, nlohmann::json::object()});
        CHECK(nextFreeRef(board, "R") == "R4");
        CHECK(refTaken(board, "R3"));
        CHECK_FALSE(refTaken(board, "R3", "R3"));
    }
}

TEST_CASE("part making") {
    SUBCASE("two-lead parts take the kind's pin names and default span") {
        const auto led = makeTwoLeadPart("led", "LED1", "red", {2, 3}, {2, 4});
        CHECK(led.pins[0].name == "A");
        CHECK(led.pins[1].name == "K");
        // 1/4 W resistor lying flat spans 4 holes (common practice, 0.4 in).
        CHECK(defaultSecondHole("resistor", {0, 0}, false) == Hole{0, 4});
        CHECK(defaultSecondHole("resistor", {0, 0}, true) == Hole{0, 1});
    }
    SUBCASE("a DIP-8 straddles strips: 0.3 in (3 holes) between its rows (JEDEC MS-001)") {
        const auto ic = makeMultiPinPart("ic", "U1", "TL072", {1, 5}, 0, 8);
        REQUIRE(ic.pins.size() == 8);
        CHECK(ic.pins[0].hole == Hole{1, 5});
        CHECK(ic.pins[3].hole == Hole{4, 5});
        CHECK(ic.pins[4].hole == Hole{4, 8});
        CHECK(ic.pins[7].hole == Hole{1, 8});
        for (int i = 0; i < 4; ++i) CHECK(ic.pins[static_cast<std::size_t>(i)].hole.row == 1 + i);
    }
    SUBCASE("a transistor stands with each lead on its own strip") {
        const auto q = makeMultiPinPart("bjt", "Q1", "BC547", {2, 2}, 0, 3);
        CHECK(q.pins[0].hole == Hole{2, 2});
        CHECK(q.pins[2].hole == Hole{4, 2});
        CHECK(q.extra.value("pinout", "") == "C-B-E");
    }
    SUBCASE("four quarter turns come back to the start; one turn is clockwise") {
        auto q = makeMultiPinPart("bjt", "Q1", "BC547", {5, 5}, 0, 3);
        const auto turned = rotatePart(q);
        // Down the column becomes leftwards along the strip when turned clockwise on screen.
        CHECK(turned.pins[1].hole == Hole{5, 4});
        CHECK(rotatePart(rotatePart(rotatePart(turned))) == q);
    }
}

TEST_CASE("pinout") {
    const auto q = makeMultiPinPart("bjt", "Q1", "2N3904", {1, 1}, 0, 3);
    SUBCASE("choices include the common orders") {
        const auto choices = pinoutChoices("bjt");
        CHECK(std::find(choices.begin(), choices.end(), "E-B-C") != choices.end());
        CHECK(std::find(choices.begin(), choices.end(), "C-B-E") != choices.end());
        CHECK(std::find(pinoutChoices("jfet").begin(), pinoutChoices("jfet").end(), "D-S-G") != pinoutChoices("jfet").end());
    }
    SUBCASE("picking an order moves the names onto the holes, first hole first") {
        const auto changed = applyPinout(q, "E-B-C");
        REQUIRE(changed);
        CHECK(changed->pins[0].name == "E");
        CHECK(changed->pins[0].hole == q.pins[0].hole);
        CHECK(changed->pins[2].name == "C");
        CHECK(changed->pins[2].hole == q.pins[2].hole);
        CHECK(changed->extra["pinout"] == "E-B-C");
    }
    SUBCASE("a wrong number of names is refused") {
        CHECK_FALSE(applyPinout(q, "E-B"));
        CHECK_FALSE(applyPinout(q, "E--C"));
    }
}

TEST_CASE("hit testing elements") {
    netcheck::Board board;
    board.parts.push_back(makeTwoLeadPart("resistor", "R1", "10k", {1, 1}, {1, 5}));
    board.links.push_back({{3, 2}, {6, 2}, false, nlohmann::json::object()});
    board.cuts.push_back({{8, 4}, netcheck::Cut::Kind::Between});
    const auto spots = layoutOffboard(board);
    using K = netcheck::edit::ElementRef::Kind;
    SUBCASE("the body between two leads selects the part") {
        const auto hit = elementAt(board, spots, {3.5f, 1.5f});
        REQUIRE(hit);
        CHECK(hit->kind == K::Part);
    }
    SUBCASE("a link is hit along its length, a between cut at its gap") {
        CHECK(elementAt(board, spots, {2.5f, 5.0f})->kind == K::Link);
        CHECK(elementAt(board, spots, {5.0f, 8.5f})->kind == K::Cut);
        CHECK_FALSE(elementAt(board, spots, {12.5f, 5.5f}));
    }
    SUBCASE("a box takes only what lies wholly inside") {
        CHECK(elementsInBox(board, spots, {0, 0}, {6, 2}).size() == 1);
        CHECK(elementsInBox(board, spots, {0, 0}, {4, 2}).empty());
    }
}

TEST_CASE("paste") {
    netcheck::Board board;
    board.parts.push_back(makeTwoLeadPart("resistor", "R1", "10k", {1, 1}, {1, 5}));
    netcheck::edit::ElementRef ref{netcheck::edit::ElementRef::Kind::Part, 0};
    const auto clip = copyOf(board, {ref});
    SUBCASE("pasted parts get free refs and land where asked") {
        auto command = pasteCommand(board, clip, {4, 2}, nullptr);
        REQUIRE(command);
        netcheck::Board after = board;
        command->apply(after);
        REQUIRE(after.parts.size() == 2);
        CHECK(after.parts[1].ref == "R2");
        CHECK(after.parts[1].pins[0].hole == Hole{4, 2});
        command->revert(after);
        CHECK(after == board);
    }
    SUBCASE("a paste that would leave the board is refused with a reason") {
        std::string reason;
        CHECK_FALSE(pasteCommand(board, clip, {0, 22}, &reason));
        CHECK_FALSE(reason.empty());
    }
}

TEST_CASE("finding fixes") {
    netcheck::Board board;
    netcheck::Finding shortFinding;
    shortFinding.type = netcheck::FindingType::Short;
    shortFinding.suggestedCut = netcheck::Cut{{2, 7}, netcheck::Cut::Kind::Hole};
    SUBCASE("a suggested cut becomes an undoable add-cut") {
        auto command = fixCommand(board, shortFinding);
        REQUIRE(command);
        netcheck::Board after = board;
        command->apply(after);
        REQUIRE(after.cuts.size() == 1);
        CHECK(after.cuts[0] == *shortFinding.suggestedCut);
        command->revert(after);
        CHECK(after == board);
        // Once the cut is there, there is nothing left to apply.
        board.cuts.push_back(*shortFinding.suggestedCut);
        CHECK_FALSE(fixCommand(board, shortFinding));
    }
    SUBCASE("suggested links become one command") {
        netcheck::Finding open;
        open.type = netcheck::FindingType::Open;
        open.suggestedLinks = {{{1, 1}, {3, 1}, false, nlohmann::json::object()}, {{4, 1}, {6, 1}, false, nlohmann::json::object()}};
        auto command = fixCommand(board, open);
        REQUIRE(command);
        netcheck::Board after = board;
        command->apply(after);
        CHECK(after.links.size() == 2);
    }
    SUBCASE("a bare link across a lead gets a sleeve") {
        board.links.push_back({{0, 2}, {4, 2}, false, nlohmann::json::object()});
        netcheck::Finding overLead;
        overLead.type = netcheck::FindingType::LinkOverLead;
        overLead.holes = {{0, 2}, {4, 2}, {2, 2}};
        auto command = fixCommand(board, overLead);
        REQUIRE(command);
        CHECK(command->label() == "Sleeve link A3-E3");
        netcheck::Board after = board;
        command->apply(after);
        CHECK(after.links[0].insulated);
        command->revert(after);
        CHECK(after == board);
        netcheck::Finding noHoles;
        noHoles.type = netcheck::FindingType::LinksTouch;
        CHECK_FALSE(fixCommand(board, noHoles));
        board.links[0].insulated = true;  // sleeved already: nothing left to apply
        CHECK_FALSE(fixCommand(board, overLead));
    }
}

TEST_CASE("capture circuit") {
    netcheck::Board board;
    board.parts.push_back(makeTwoLeadPart("resistor", "R1", "10k", {1, 1}, {1, 5}));
    board.parts.push_back(makeTwoLeadPart("resistor", "R2", "4k7", {1, 8}, {3, 8}));
    const auto circuit = captureCircuit(board);
    CHECK(circuit.parts.size() == 2);
    // R1 and R2 share strip B; every other pin stands alone: one net of two or more pins.
    const auto nets = netcheck::boardNets(board);
    std::size_t joined = 0;
    for (const auto& group : nets) joined += group.size() >= 2;
    CHECK(circuit.nets.size() == joined);
    CHECK(circuit.netOf({"R1", "1"}) == circuit.netOf({"R2", "1"}));
}

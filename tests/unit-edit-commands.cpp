// Edit commands: each one applies and reverts exactly (order of every list included), refuses to
// run on a board it was not made for, names itself for the Edit menu, and merges drags.
#include <doctest/doctest.h>

#include "netcheck/edit/edit.hpp"

using namespace netcheck;
using namespace netcheck::edit;

namespace {

Part resistor(std::string ref, Hole a, Hole b) {
    return Part{std::move(ref), "resistor", "10k", {{"1", a}, {"2", b}}, nlohmann::json::object()};
}

// A small layout with something in every list.
Board sampleBoard() {
    Board board;
    board.title = "Fuzz pedal";
    board.rows = 8;
    board.cols = 12;
    board.parts = {resistor("R1", {0, 1}, {0, 5}), resistor("R2", {2, 1}, {2, 5}),
                   Part{"Q1", "npn", "2N3904", {{"E", {4, 3}}, {"B", {5, 3}}, {"C", {6, 3}}}, {}}};
    board.links = {Link{{0, 0}, {2, 0}, false, {}}, Link{{3, 7}, {5, 7}, false, {}}};
    board.cuts = {Cut{{0, 3}, Cut::Kind::Hole}, Cut{{2, 6}, Cut::Kind::Between}};
    board.offboard = {OffboardPart{"VR1", "pot", "B100k", {"1", "2", "3"}, {}},
                      OffboardPart{"J1", "jack", "", {"T", "S"}, {}}};
    board.wires = {Wire{Endpoint::atLug({"VR1", "2"}), Endpoint::atHole({1, 9}), "green", {}},
                   Wire{Endpoint::atLug({"J1", "T"}), Endpoint::atHole({3, 9}), "yellow", {}},
                   Wire{Endpoint::atLug({"VR1", "1"}), Endpoint::atHole({7, 9}), "black", {}}};
    return board;
}

// apply() then revert() must give back the very board; apply() again the same edited board.
Board checkRoundTrip(Command& command, const Board& start) {
    Board board = start;
    command.apply(board);
    const Board edited = board;
    command.revert(board);
    CHECK(board == start);
    command.apply(board);
    CHECK(board == edited);
    return edited;
}

}  // namespace

TEST_CASE("edit commands") {
    const Board start = sampleBoard();

    SUBCASE("parts") {
        SUBCASE("add appends, and redo inserts at the same place") {
            AddPart add(resistor("R3", {7, 0}, {7, 4}));
            const Board edited = checkRoundTrip(add, start);
            REQUIRE(edited.parts.size() == 4);
            CHECK(edited.parts[3].ref == "R3");
            CHECK(add.label() == "Add R3");
            CHECK(add.touched() == std::vector<Hole>{{7, 0}, {7, 4}});
        }
        SUBCASE("add at an index") {
            AddPart add(resistor("R3", {7, 0}, {7, 4}), 1);
            const Board edited = checkRoundTrip(add, start);
            CHECK(edited.parts[1].ref == "R3");
            CHECK(edited.parts[2].ref == "R2");
        }
        SUBCASE("remove from the middle comes back in the middle") {
            RemovePart remove(start, 1);
            const Board edited = checkRoundTrip(remove, start);
            CHECK(edited.parts.size() == 2);
            CHECK(edited.parts[1].ref == "Q1");
            CHECK(remove.label() == "Remove R2");
        }
        SUBCASE("replace keeps old and new") {
            Part moved = start.parts[0];
            for (Pin& pin : moved.pins) pin.hole.row += 1;
            ReplacePart replace(start, 0, moved);
            const Board edited = checkRoundTrip(replace, start);
            CHECK(edited.parts[0] == moved);
            CHECK(replace.label() == "Move R1");
            CHECK(replace.touched().size() == 4);
        }
        SUBCASE("labels say what changed") {
            auto labelFor = [&](std::size_t index, auto change) {
                Part after = start.parts[index];
                change(after);
                return ReplacePart(start, index, after).label();
            };
            CHECK(labelFor(0, [](Part& p) { p.pins[1].hole.col = 2; }) == "Stretch R1");
            CHECK(labelFor(0, [](Part& p) {
                      p.pins[1].hole = {4, 1};  // a quarter turn about pin 1
                      p.extra["rotation"] = 90;
                  }) == "Rotate R1");
            CHECK(labelFor(0, [](Part& p) { p.ref = "R9"; }) == "Rename R1 to R9");
            CHECK(labelFor(0, [](Part& p) { p.value = "4k7"; }) == "Set R1 to 4k7");
            CHECK(labelFor(2, [](Part& p) {
                      p.pins[0].name = "C";
                      p.pins[2].name = "E";
                  }) == "Set pinout of Q1");
            CHECK(labelFor(0, [](Part& p) { p.kind = "diode"; }) == "Edit R1");
            CHECK(ReplacePart(start, 0, start.parts[0], "Standing R1").label() == "Standing R1");
        }
    }

    SUBCASE("links, cuts, off-board parts, wires") {
        SUBCASE("links") {
            AddLink add(Link{{4, 0}, {6, 0}, false, {}});
            checkRoundTrip(add, start);
            CHECK(add.label() == "Add link E1\u2013G1");
            RemoveLink remove(start, 0);
            CHECK(checkRoundTrip(remove, start).links.size() == 1);
            CHECK(remove.label() == "Remove link A1\u2013C1");
            Link moved = start.links[1];
            moved.to = {6, 7};
            ReplaceLink replace(start, 1, moved);
            CHECK(checkRoundTrip(replace, start).links[1].to == Hole{6, 7});
            CHECK(replace.label() == "Move link D8\u2013F8");
            moved = start.links[1];
            moved.copperSide = true;
            CHECK(ReplaceLink(start, 1, moved).label() == "Edit link D8\u2013F8");
        }
        SUBCASE("cuts toggle") {
            auto add = toggleCut(start, Cut{{4, 5}, Cut::Kind::Hole});
            CHECK(add->label() == "Add cut E6");
            CHECK(checkRoundTrip(*add, start).cuts.back() == Cut{{4, 5}, Cut::Kind::Hole});
            auto remove = toggleCut(start, Cut{{2, 6}, Cut::Kind::Between});
            CHECK(remove->label() == "Remove cut C7|C8");
            CHECK(checkRoundTrip(*remove, start).cuts.size() == 1);
            CHECK(remove->touched() == std::vector<Hole>{{2, 6}, {2, 7}});
            // A between cut and a hole cut at the same hole are different cuts.
            auto other = toggleCut(start, Cut{{0, 3}, Cut::Kind::Between});
            CHECK(other->label() == "Add cut A4|A5");
        }
        SUBCASE("off-board parts") {
            AddOffboard add(OffboardPart{"SW1", "switch", "", {"1", "2"}, {}});
            checkRoundTrip(add, start);
            CHECK(add.label() == "Add SW1");
            CHECK(add.touched().empty());
            RemoveOffboard remove(start, 0);
            CHECK(checkRoundTrip(remove, start).offboard[0].ref == "J1");
            OffboardPart changed = start.offboard[0];
            changed.value = "A500k";
            ReplaceOffboard replace(start, 0, changed);
            checkRoundTrip(replace, start);
            CHECK(replace.label() == "Set VR1 to A500k");
        }
        SUBCASE("wires") {
            AddWire add(Wire{Endpoint::atLug({"J1", "S"}), Endpoint::atHole({7, 0}), "black", {}});
            checkRoundTrip(add, start);
            CHECK(add.label() == "Add wire J1.S\u2013H1");
            CHECK(add.touched() == std::vector<Hole>{{7, 0}});
            RemoveWire remove(start, 1);
            CHECK(checkRoundTrip(remove, start).wires[1].color == "black");
            Wire recoloured = start.wires[0];
            recoloured.color = "red";
            CHECK(ReplaceWire(start, 0, recoloured).label() == "Colour wire VR1.2\u2013B10 red");
            Wire moved = start.wires[0];
            moved.to = Endpoint::atHole({1, 10});
            ReplaceWire replace(start, 0, moved);
            checkRoundTrip(replace, start);
            CHECK(replace.label() == "Move wire VR1.2\u2013B10");
        }
    }

    SUBCASE("title and circuit") {
        SetTitle title(start, "Fuzz pedal v2");
        CHECK(checkRoundTrip(title, start).title == "Fuzz pedal v2");
        CHECK(title.label() == "Set title");

        Circuit circuit;
        circuit.parts["R1"] = CircuitPart{"resistor", "10k", {}, nlohmann::json::object()};
        circuit.nets["VCC"] = {PinRef{"R1", "1"}};
        SetCircuit set(start, circuit);
        CHECK(checkRoundTrip(set, start).circuit == circuit);
        CHECK(set.label() == "Set circuit");
        Board withCircuit = start;
        withCircuit.circuit = circuit;
        SetCircuit remove(withCircuit, std::nullopt);
        CHECK_FALSE(checkRoundTrip(remove, withCircuit).circuit.has_value());
        CHECK(remove.label() == "Remove circuit");
    }

    SUBCASE("a command refuses a board it was not made for, and changes nothing") {
        Board board = start;
        RemovePart remove(board, 0);
        board.parts[0].value = "22k";  // someone changed R1 behind the command's back
        const Board before = board;
        CHECK_THROWS_AS(remove.apply(board), OutOfStepError);
        CHECK(board == before);

        AddLink add(Link{{4, 0}, {6, 0}, false, {}});
        board = start;
        add.apply(board);
        board.links.pop_back();
        CHECK_THROWS_AS(add.revert(board), OutOfStepError);

        CHECK_THROWS_AS(RemoveWire(start, 3), OutOfStepError);
        CHECK_THROWS_AS(ReplaceLink(start, 2, Link{}), OutOfStepError);
        SetTitle title(start, "x");
        board = start;
        board.title = "y";
        CHECK_THROWS_AS(title.apply(board), OutOfStepError);
    }

    SUBCASE("merging") {
        Board board = start;
        Part step1 = board.parts[0];
        for (Pin& pin : step1.pins) pin.hole.col += 1;
        ReplacePart first(board, 0, step1);
        first.apply(board);
        Part step2 = step1;
        for (Pin& pin : step2.pins) pin.hole.row += 2;
        ReplacePart second(board, 0, step2);
        second.apply(board);
        SUBCASE("a replace of the same part merges: first old value, newest new value") {
            REQUIRE(first.mergeWith(second));
            CHECK(first.before() == start.parts[0]);
            CHECK(first.after() == step2);
            first.revert(board);
            CHECK(board == start);
        }
        SUBCASE("other parts, other kinds and out-of-order commands do not merge") {
            ReplacePart otherPart(board, 1, board.parts[1]);
            CHECK_FALSE(first.mergeWith(otherPart));
            ReplaceLink link(board, 0, board.links[0]);
            CHECK_FALSE(first.mergeWith(link));
            // A replace that starts from another state is not the next step of this drag.
            ReplacePart fromStart(start, 0, step2);
            CHECK_FALSE(first.mergeWith(fromStart));
        }
        SUBCASE("titles typed one letter at a time merge") {
            Board b = start;
            SetTitle t1(b, "F");
            t1.apply(b);
            SetTitle t2(b, "Fu");
            t2.apply(b);
            CHECK(t1.mergeWith(t2));
            t1.revert(b);
            CHECK(b.title == start.title);
        }
    }
}

TEST_CASE("compound command") {
    const Board start = sampleBoard();

    SUBCASE("applies in order, reverts in reverse") {
        std::vector<std::unique_ptr<Command>> members;
        members.push_back(std::make_unique<AddCut>(Cut{{5, 5}, Cut::Kind::Hole}));
        // Removes the cut the first member added: only right if members run in order.
        Board afterFirst = start;
        afterFirst.cuts.push_back(Cut{{5, 5}, Cut::Kind::Hole});
        members.push_back(std::make_unique<RemoveCut>(afterFirst, 2));
        members.push_back(std::make_unique<AddLink>(Link{{5, 5}, {7, 5}, false, {}}));
        CompoundCommand group("Apply fix: link F6\u2013H6", std::move(members));
        const Board edited = checkRoundTrip(group, start);
        CHECK(edited.cuts == start.cuts);
        CHECK(edited.links.size() == 3);
        CHECK(group.label() == "Apply fix: link F6\u2013H6");
        CHECK(group.touched().size() == 4);
    }

    SUBCASE("a failing member undoes the members before it") {
        std::vector<std::unique_ptr<Command>> members;
        members.push_back(std::make_unique<AddCut>(Cut{{5, 5}, Cut::Kind::Hole}));
        members.push_back(std::make_unique<AddLink>(Link{{5, 5}, {7, 5}, false, {}}, 99));
        CompoundCommand group("Paste", std::move(members));
        Board board = start;
        CHECK_THROWS_AS(group.apply(board), OutOfStepError);
        CHECK(board == start);
    }
}

TEST_CASE("selection commands") {
    const Board start = sampleBoard();
    using Kind = ElementRef::Kind;

    SUBCASE("delete a selection, in any order, undoes to the same board") {
        auto del = deleteElements(start, {{Kind::Part, 0}, {Kind::Link, 1}, {Kind::Part, 2},
                                          {Kind::Cut, 0}, {Kind::Part, 0}});
        REQUIRE(del);
        const Board edited = checkRoundTrip(*del, start);
        REQUIRE(edited.parts.size() == 1);
        CHECK(edited.parts[0].ref == "R2");
        CHECK(edited.links.size() == 1);
        CHECK(edited.cuts.size() == 1);
        CHECK(del->label() == "Delete 4 items");
    }
    SUBCASE("deleting an off-board part takes its wires along") {
        auto del = deleteElements(start, {{Kind::Offboard, 0}});
        const Board edited = checkRoundTrip(*del, start);
        CHECK(edited.offboard.size() == 1);
        REQUIRE(edited.wires.size() == 1);
        CHECK(edited.wires[0].from.lug.ref == "J1");
        CHECK(del->label() == "Delete 3 items");
    }
    SUBCASE("a single element reads as itself; nothing selected is no command") {
        CHECK(deleteElements(start, {{Kind::Link, 0}})->label() == "Remove link A1\u2013C1");
        CHECK(deleteElements(start, {}) == nullptr);
        CHECK_THROWS_AS(deleteElements(start, {{Kind::Part, 7}}), OutOfStepError);
    }
    SUBCASE("move a selection; consecutive moves of one drag merge") {
        const std::vector<ElementRef> selection{
            {Kind::Part, 1}, {Kind::Link, 0}, {Kind::Cut, 1}, {Kind::Wire, 0}, {Kind::Offboard, 0}};
        Board board = start;
        auto first = moveElements(board, selection, 1, 0);
        first->apply(board);
        auto second = moveElements(board, selection, 0, 2);
        second->apply(board);
        CHECK(board.parts[1].pins[0].hole == Hole{3, 3});
        CHECK(board.links[0].from == Hole{1, 2});
        CHECK(board.cuts[1].hole == Hole{3, 8});
        CHECK(board.wires[0].to.hole == Hole{2, 11});
        CHECK(board.offboard == start.offboard);
        REQUIRE(first->mergeWith(*second));
        CHECK(first->label() == "Move 4 items");
        first->revert(board);
        CHECK(board == start);
        CHECK(moveElements(start, selection, 0, 0) == nullptr);
        CHECK(moveElements(start, {{Kind::Part, 0}}, 0, 1)->label() == "Move R1");
    }
}

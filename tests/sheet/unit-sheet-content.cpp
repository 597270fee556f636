// What the build sheet lists: numbered cuts, bill of materials, wiring, assembly order.
#include <doctest/doctest.h>

#include <algorithm>

#include "editor/sheet/sheet_content.hpp"

using netcheck::Board;
using netcheck::Cut;
using netcheck::Hole;
using netcheck::Part;
using namespace sheet;

namespace {

Part part(const std::string& ref, const std::string& kind, const std::string& value,
          std::vector<netcheck::Pin> pins) {
    Part p;
    p.ref = ref;
    p.kind = kind;
    p.value = value;
    p.pins = std::move(pins);
    return p;
}

Board sampleBoard() {
    Board board;
    board.rows = 10;
    board.cols = 24;
    board.parts.push_back(part("R10", "resistor", "4k7", {{"1", {0, 0}}, {"2", {0, 4}}}));
    board.parts.push_back(part("R2", "resistor", "4.7k", {{"1", {1, 0}}, {"2", {1, 4}}}));
    board.parts.push_back(part("R1", "resistor", "1k", {{"1", {2, 0}}, {"2", {2, 4}}}));
    board.parts.push_back(part("C1", "electrolytic", "10u", {{"+", {3, 0}}, {"-", {4, 0}}}));
    Part q = part("Q1", "bjt", "BC549", {{"C", {5, 5}}, {"B", {6, 5}}, {"E", {7, 5}}});
    q.extra["pinout"] = "C-B-E";
    board.parts.push_back(q);
    board.offboard.push_back({"VR1", "pot", "B100k", {"1", "2", "3"}, {}});
    board.cuts = {
        {{4, 7}, Cut::Kind::Hole}, {{0, 2}, Cut::Kind::Between}, {{0, 1}, Cut::Kind::Hole}};
    board.links.push_back({{0, 10}, {3, 10}, false, {}});
    netcheck::Wire wire;
    wire.from = netcheck::Endpoint::atLug({"VR1", "2"});
    wire.to = netcheck::Endpoint::atHole({2, 20});
    wire.color = "yellow";
    board.wires.push_back(wire);
    return board;
}

const BomLine* findLine(const std::vector<BomLine>& bom, const std::string& ref) {
    for (const BomLine& line : bom) {
        if (std::find(line.refs.begin(), line.refs.end(), ref) != line.refs.end()) return &line;
    }
    return nullptr;
}

std::size_t stepOf(const std::vector<AssemblyStep>& steps, const std::string& word) {
    for (std::size_t i = 0; i < steps.size(); ++i) {
        if (steps[i].text.find(word) != std::string::npos) return i;
        for (const std::string& ref : steps[i].refs) {
            if (ref == word) return i;
        }
    }
    FAIL("no step mentions " << word);
    return 0;
}

}  // namespace

TEST_CASE("sheet content") {
    Board board = sampleBoard();

    SUBCASE("cuts are numbered by strip, then hole") {
        auto cuts = numberedCuts(board);
        REQUIRE(cuts.size() == 3);
        CHECK(netcheck::cutName(cuts[0]) == "A2");
        CHECK(netcheck::cutName(cuts[1]) == "A3|A4");
        CHECK(netcheck::cutName(cuts[2]) == "E8");
    }

    SUBCASE("seen from the copper side, hole 1 is the last from the left") {
        // The board turned over is mirrored left-right (hole 1 at the right).
        CHECK(fromLeftComponent(board, 0) == 1);
        CHECK(fromLeftCopper(board, 0) == 24);
        CHECK(fromLeftCopper(board, 23) == 1);
    }

    SUBCASE("bill of materials") {
        auto bom = billOfMaterials(board);
        SUBCASE("same kind and value share a line, refs in natural order") {
            const BomLine* line = findLine(bom, "R2");
            REQUIRE(line != nullptr);
            CHECK(line->quantity == 2);
            CHECK(line->refs == std::vector<std::string>{"R2", "R10"});
        }
        SUBCASE("resistor colour bands by name") {
            // IEC 60062 worked examples: 4.7 kOhm 5 % = yellow violet red gold;
            // 1 kOhm 5 % = brown black red gold.
            CHECK(findLine(bom, "R2")->notes.find("yellow violet red gold") != std::string::npos);
            CHECK(findLine(bom, "R1")->notes.find("brown black red gold") != std::string::npos);
            CHECK(colourBandsText("22k", 5.0) == "red red orange gold");
            // IEC 60062: +-1 % parts carry three significant figures: 1 kOhm = brown black black
            // brown brown.
            CHECK(colourBandsText("1k", 1.0) == "brown black black brown brown");
            CHECK(colourBandsText("not a value", 5.0).empty());
        }
        SUBCASE("pinout, taper and off-board in the notes") {
            CHECK(findLine(bom, "Q1")->notes.find("C-B-E") != std::string::npos);
            CHECK(findLine(bom, "VR1")->notes.find("taper B") != std::string::npos);
            CHECK(findLine(bom, "VR1")->notes.find("off-board") != std::string::npos);
        }
        SUBCASE("grouped by kind: resistors before capacitors, lower values first") {
            CHECK(bom[0].refs.front() == "R1");
            CHECK(findLine(bom, "C1") > findLine(bom, "R2"));
        }
        SUBCASE("every part appears once") {
            int total = 0;
            for (const BomLine& line : bom) total += line.quantity;
            CHECK(total == 6);
        }
    }

    SUBCASE("wiring list names both ends, the colour and the off-board part") {
        auto wires = wiringList(board);
        REQUIRE(wires.size() == 1);
        CHECK(wires[0].from == "VR1.2");
        CHECK(wires[0].to == "C21");
        CHECK(wires[0].colour == "yellow");
        CHECK(wires[0].note.find("Potentiometer B100k, lug 2") != std::string::npos);
    }

    SUBCASE("link list gives the length centre to centre") {
        auto links = linkList(board);
        REQUIRE(links.size() == 1);
        CHECK(links[0].from == "A11");
        CHECK(links[0].to == "D11");
        CHECK(links[0].lengthMm == doctest::Approx(3 * 2.54));
        CHECK_FALSE(links[0].insulated);
        board.links[0].insulated = true;
        CHECK(linkList(board)[0].insulated);  // the sheet says to sleeve it
    }

    SUBCASE("assembly order (common practice: cuts, links, low to tall, wiring last)") {
        auto steps = assemblyOrder(board);
        std::size_t cuts = stepOf(steps, "track cuts");
        std::size_t links = stepOf(steps, "link");
        std::size_t resistors = stepOf(steps, "R1");
        std::size_t transistor = stepOf(steps, "Q1");
        std::size_t electrolytic = stepOf(steps, "C1");
        std::size_t wiring = stepOf(steps, "Off-board wiring");
        CHECK(cuts < links);
        CHECK(links < resistors);
        CHECK(resistors < transistor);
        CHECK(transistor < electrolytic);
        CHECK(electrolytic < wiring);
        CHECK(steps[links].text.find("Sleeve") == std::string::npos);
        board.links[0].insulated = true;
        CHECK(assemblyOrder(board)[links].text.find("Sleeve the one marked sleeved") != std::string::npos);
    }

    SUBCASE("board size in holes and millimetres") {
        // 24 x 10 holes at 0.1 in = 60.96 x 25.40 mm.
        CHECK(boardSizeText(board) == "24 x 10 holes (60.96 x 25.40 mm)");
    }

    SUBCASE("natural order of references") {
        CHECK(refLess("R2", "R10"));
        CHECK_FALSE(refLess("R10", "R2"));
        CHECK(refLess("C9", "R1"));
    }
}

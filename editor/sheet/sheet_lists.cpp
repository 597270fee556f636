#include "sheet_lists.hpp"

#include <cstdio>
#include <string>

#include "check_banner.hpp"
#include "meter_table.hpp"
#include "sheet_content.hpp"
#include "sheet_table.hpp"

#include "netcheck/model/wording.hpp"

namespace sheet {

namespace {

using netcheck::Board;
using netcheck::Cut;


std::string millimetres(double mm) {
    char text[32];
    std::snprintf(text, sizeof text, "%.1f", mm);
    return text;
}

void drawFindings(PageFlow& flow, const netcheck::CheckReport& report) {
    drawHeading(flow, "Check result at print time");
    CheckBanner banner = checkBanner(report);
    double top = flow.place(7.5);
    drawCheckBanner(flow.cr(), {flow.left(), top, flow.width(), 6.0}, banner);
    if (report.errors.empty() && report.warnings.empty()) return;
    Table table{
        {{"#"}, {"severity"}, {"type"}, {"what and where", 3}, {"suggested fix", 2}}, {}, false};
    int number = 1;
    for (const auto* list : {&report.errors, &report.warnings}) {
        for (const auto& finding : *list) {
            table.rows.push_back(
                {std::to_string(number++),
                 finding.severity() == netcheck::Severity::Error ? "ERROR" : "warning", std::string(finding.id()),
                 finding.message, finding.fix});
        }
    }
    drawTable(flow, table);
}

void drawBoardFacts(PageFlow& flow, const Board& board) {
    drawHeading(flow, "Board");
    std::string copper = board.copper == netcheck::CopperPattern::Strips
                             ? "copper strips along the rows (strips A, B, C ... top to bottom)"
                             : "plain pads (every hole its own pad)";
    char pitch[32];
    std::snprintf(pitch, sizeof pitch, "%.2f", board.pitchMm);
    drawParagraph(flow, "Size: " + boardSizeText(board) + ", pitch " + pitch + " mm; " + copper +
                            ". " + netcheck::plural(board.parts.size(), "part") + " on the board, " +
                            std::to_string(board.offboard.size()) + " off the board, " +
                            netcheck::plural(board.cuts.size(), "cut") + ", " +
                            netcheck::plural(board.links.size(), "link") + ", " +
                            netcheck::plural(board.wires.size(), "wire") + ".");
}

void drawAssembly(PageFlow& flow, const Board& board) {
    drawHeading(flow, "Assembly order (tick as you go)");
    Table table{{{"step"}, {"what to do", 3}, {"parts", 2}}, {}, true};
    int step = 1;
    for (const AssemblyStep& item : assemblyOrder(board)) {
        table.rows.push_back({std::to_string(step++), item.text, netcheck::joined(item.refs)});
    }
    drawTable(flow, table);
}

void drawBom(PageFlow& flow, const Board& board) {
    drawHeading(flow, "Bill of materials");
    Table table{
        {{"qty", 0, Align::Right}, {"refs", 1}, {"value"}, {"kind"}, {"notes", 2}}, {}, true};
    for (const BomLine& line : billOfMaterials(board)) {
        table.rows.push_back(
            {std::to_string(line.quantity), netcheck::joined(line.refs), line.value, line.label, line.notes});
    }
    if (table.rows.empty()) {
        drawParagraph(flow, "No parts.");
        return;
    }
    drawTable(flow, table);
}

std::string ordinal(int n) {
    const char* suffix = "th";
    if (n % 100 < 11 || n % 100 > 13) {
        suffix = n % 10 == 1 ? "st" : n % 10 == 2 ? "nd" : n % 10 == 3 ? "rd" : "th";
    }
    return std::to_string(n) + suffix;
}

std::string sideText(int fromLeft, bool between) {
    return between ? "between " + ordinal(fromLeft) + " and " + ordinal(fromLeft + 1) +
                         " hole from the left"
                   : ordinal(fromLeft) + " hole from the left";
}

void drawCutList(PageFlow& flow, const Board& board, const std::vector<Cut>& cuts) {
    drawHeading(flow, "Track cuts (numbered as on the copper side)");
    if (cuts.empty()) {
        drawParagraph(flow, "No cuts.");
        return;
    }
    Table table{{{"#", 0, Align::Right},
                 {"cut"},
                 {"kind"},
                 {"seen from the component side", 1},
                 {"seen from the copper side (mirrored)", 1}},
                {},
                true};
    for (std::size_t i = 0; i < cuts.size(); ++i) {
        const Cut& cut = cuts[i];
        bool between = cut.kind == Cut::Kind::Between;
        std::string strip = "strip " + netcheck::rowName(cut.hole.row) + ", ";
        // Seen from below, the gap after hole n is the gap before it when counting from the left.
        int copperCol = fromLeftCopper(board, between ? cut.hole.col + 1 : cut.hole.col);
        table.rows.push_back({std::to_string(i + 1), netcheck::cutName(cut),
                              between ? "between holes (knife)" : "hole (drill)",
                              strip + sideText(fromLeftComponent(board, cut.hole.col), between),
                              strip + sideText(copperCol, between)});
    }
    drawTable(flow, table);
}

void drawLinkList(PageFlow& flow, const Board& board) {
    drawHeading(flow, "Wire links");
    if (board.links.empty()) {
        drawParagraph(flow, "No links.");
        return;
    }
    Table table{
        {{"#", 0, Align::Right}, {"from"}, {"to"}, {"length mm", 0, Align::Right}, {"side", 1}},
        {},
        true};
    int number = 1;
    for (const LinkLine& link : linkList(board)) {
        const std::string side = link.copperSide ? "copper side (bridge)" : "component side";
        table.rows.push_back({std::to_string(number++), link.from, link.to,
                              millimetres(link.lengthMm), link.insulated ? side + ", sleeved" : side});
    }
    drawTable(flow, table);
}

void drawWiringList(PageFlow& flow, const Board& board) {
    drawHeading(flow, "Off-board wiring (fit last)");
    if (board.wires.empty()) {
        drawParagraph(flow, "No off-board wires.");
        return;
    }
    Table table{
        {{"#", 0, Align::Right}, {"from"}, {"to"}, {"colour"}, {"off-board end", 1}}, {}, true};
    int number = 1;
    for (const WiringLine& wire : wiringList(board)) {
        table.rows.push_back(
            {std::to_string(number++), wire.from, wire.to, wire.colour, wire.note});
    }
    drawTable(flow, table);
}

}  // namespace

void drawLists(PageFlow& flow, const Board& board, const netcheck::CheckReport& report,
               const std::vector<Cut>& cuts, const netcheck::BenchVoltagesResult& voltages) {
    drawFindings(flow, report);
    drawBoardFacts(flow, board);
    drawAssembly(flow, board);
    drawBom(flow, board);
    drawCutList(flow, board, cuts);
    drawLinkList(flow, board);
    drawWiringList(flow, board);
    drawMeterTable(flow, voltages);
}

}  // namespace sheet

// View > Bench voltages: the expected DC voltage of each net at its probe hole, with the cautions
// in a caption. Grey while the figures are for an earlier state of the board (being recomputed).
#include <string>

#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"
#include "netcheck/voltage/voltage_report.hpp"

namespace stripsmith {

namespace {

void drawCaption(const LayerFrame& f, const std::string& text) {
    const ImVec2 pos{f.clipMin.x + 16, f.clipMax.y - ImGui::GetFontSize() - 12};
    const ImVec2 size = ImGui::CalcTextSize(text.c_str());
    f.draw->AddRectFilled({pos.x - 6, pos.y - 3}, {pos.x + size.x + 6, pos.y + size.y + 3},
                          palette::rgba(255, 248, 200, 235), 4);
    f.draw->AddText(pos, palette::kText, text.c_str());
}

}  // namespace

void drawBenchVoltages(const LayerFrame& f) {
    if (f.voltages == nullptr) return;
    if (!f.voltages->value) {
        drawCaption(f, "Bench voltages: " + f.voltages->error);
        return;
    }
    const float size = canvasTextSize(f, 0.5f);
    const ImU32 ink = f.voltagesStale ? palette::rgba(120, 120, 120, 255) : palette::kText;
    for (const netcheck::NetReading& net : f.voltages->value->nets) {
        const auto hole = netcheck::parseHole(net.probe);
        if (!hole || !f.board.contains(*hole) || size <= 0) continue;
        const std::string text = net.state == netcheck::NetState::Known
                                     ? netcheck::formatVolts(net.nominal)
                                     : std::string("?");
        const ImVec2 p = f.hole(*hole);
        const ImVec2 extent = ImGui::GetFont()->CalcTextSizeA(size, 1e9f, 0, text.c_str());
        const ImVec2 at{p.x - extent.x / 2, p.y - extent.y / 2};
        f.draw->AddRectFilled({at.x - 3, at.y - 1}, {at.x + extent.x + 3, at.y + extent.y + 1},
                              palette::rgba(255, 248, 200, 230), 3);
        f.draw->AddText(ImGui::GetFont(), size, at, ink, text.c_str());
    }
    drawCaption(f, std::string(f.voltagesStale ? "Bench voltages (updating)" : "Bench voltages") +
                       ": DC estimates, black lead on " + f.voltages->value->ground +
                       ". Extra-low-voltage only; keep the probe off neighbouring strips.");
}

}  // namespace stripsmith

// Substrate, copper, edge labels and the caption naming the side shown.
#include <algorithm>
#include <cstdio>
#include <string>

#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"

namespace stripsmith {

float canvasTextSize(const CanvasFrame& f, float pitchFraction) {
    const float size = f.t.holePx * pitchFraction;
    if (size < 8.0f) return 0.0f;
    return std::min(size, 28.0f);
}

void drawSubstrate(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const ImVec2 a = f.at({0, 0});
    const ImVec2 b = f.at({static_cast<float>(board.cols), static_cast<float>(board.rows)});
    const ImVec2 lo{std::min(a.x, b.x), a.y};
    const ImVec2 hi{std::max(a.x, b.x), b.y};
    const ImU32 fill = f.side == Side::Copper ? palette::kBoardCopperSide : palette::kBoardComponent;
    f.draw->AddRectFilled({lo.x + 3, lo.y + 3}, {hi.x + 3, hi.y + 3}, palette::rgba(0, 0, 0, 90), 3.0f);
    f.draw->AddRectFilled(lo, hi, fill, 3.0f);
    f.draw->AddRect(lo, hi, palette::kBoardEdge, 3.0f, 0, 2.0f);
}

namespace {

void drawStrips(const CanvasFrame& f) {
    const ImU32 colour = f.side == Side::Copper       ? palette::kCopper
                         : f.side == Side::SeeThrough ? palette::kCopperSeeThrough
                                                      : palette::kStripFaint;
    const float half = f.side == Side::Component ? 0.30f : 0.40f;
    const float x0 = static_cast<float>(f.firstCol);
    const float x1 = static_cast<float>(f.lastCol + 1);
    for (int r = f.firstRow; r <= f.lastRow; ++r) {
        const float y = static_cast<float>(r) + 0.5f;
        const ImVec2 a = f.at({x0 + 0.04f, y - half});
        const ImVec2 b = f.at({x1 - 0.04f, y + half});
        f.draw->AddRectFilled({std::min(a.x, b.x), a.y}, {std::max(a.x, b.x), b.y}, colour, f.t.len(0.08f));
    }
}

void drawPads(const CanvasFrame& f) {
    const ImU32 colour = f.side == Side::Component ? palette::kStripFaint : palette::kCopper;
    for (int r = f.firstRow; r <= f.lastRow; ++r)
        for (int c = f.firstCol; c <= f.lastCol; ++c)
            f.draw->AddCircleFilled(f.hole({r, c}), f.t.len(0.40f), colour, 12);
}

void drawHoles(const CanvasFrame& f) {
    if (f.t.holePx < 4.0f) return;  // too small to see: strips alone read as the board
    const float radius = f.t.len(0.15f);
    const bool cheap = f.t.holePx < 10.0f;
    for (int r = f.firstRow; r <= f.lastRow; ++r)
        for (int c = f.firstCol; c <= f.lastCol; ++c) {
            const ImVec2 p = f.hole({r, c});
            if (cheap) f.draw->AddRectFilled({p.x - radius, p.y - radius}, {p.x + radius, p.y + radius}, palette::kHole);
            else f.draw->AddCircleFilled(p, radius, palette::kHole, 10);
        }
}

}  // namespace

void drawCopper(const LayerFrame& f) {
    if (f.board.copper == netcheck::CopperPattern::Pads) drawPads(f);
    else drawStrips(f);
    drawHoles(f);
}

void drawEdgeLabels(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const float size = canvasTextSize(f, 0.48f);
    if (size <= 0.0f) return;
    ImFont* font = ImGui::GetFont();
    const int step = f.t.holePx >= 18.0f ? 1 : 5;
    for (int r = f.firstRow; r <= f.lastRow; ++r) {
        const std::string name = netcheck::rowName(r);
        const ImVec2 textSize = font->CalcTextSizeA(size, FLT_MAX, 0.0f, name.c_str());
        for (float x : {-0.75f, static_cast<float>(board.cols) + 0.75f}) {
            const ImVec2 p = f.at({x, static_cast<float>(r) + 0.5f});
            f.draw->AddText(font, size, {p.x - textSize.x * 0.5f, p.y - textSize.y * 0.5f}, palette::kLabel,
                            name.c_str());
        }
    }
    for (int c = f.firstCol; c <= f.lastCol; ++c) {
        if ((c + 1) % step != 0 && c != 0) continue;
        char text[16];
        std::snprintf(text, sizeof text, "%d", c + 1);
        const ImVec2 textSize = font->CalcTextSizeA(size, FLT_MAX, 0.0f, text);
        for (float y : {-0.7f, static_cast<float>(board.rows) + 0.7f}) {
            const ImVec2 p = f.at({static_cast<float>(c) + 0.5f, y});
            f.draw->AddText(font, size, {p.x - textSize.x * 0.5f, p.y - textSize.y * 0.5f},
                            palette::kLabelDim, text);
        }
    }
}

void drawSideCaption(const LayerFrame& f) {
    const ImVec2 pos = f.clipMin;
    if (f.side == Side::Copper) {
        const char* caption = "COPPER SIDE - seen from below, mirrored: hole 1 is on the right";
        f.draw->AddRectFilled({pos.x + 8, pos.y + 8},
                              {pos.x + 8 + ImGui::CalcTextSize(caption).x + 16, pos.y + 12 + ImGui::GetFontSize() + 4},
                              palette::rgba(222, 142, 74, 230), 4);
        f.draw->AddText({pos.x + 16, pos.y + 12}, palette::kText, caption);
    } else if (f.side == Side::SeeThrough) {
        f.draw->AddText({pos.x + 16, pos.y + 12}, palette::kLabel, "SEE-THROUGH - component side with the copper below");
    }
}

}  // namespace stripsmith

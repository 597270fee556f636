// Substrate, copper, edge labels and the caption naming the side shown.
#include <algorithm>
#include <cstdio>
#include <string>

#include "editor/canvas/canvas_labels.hpp"
#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"

namespace stripsmith {

float canvasTextSize(const CanvasFrame& f, float pitchFraction) {
    return labelTextSize(f.t.holePx, pitchFraction);
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

namespace {

// Room between a pinned letter or number and the canvas edge, and half the width of a letter's
// column (so a pinned letter sits wholly inside the canvas).
constexpr float kPinnedMargin = 4.0f;

ImVec2 textCentredAt(ImVec2 centre, ImVec2 size) {
    return {centre.x - size.x * 0.5f, centre.y - size.y * 0.5f};
}

void backdrop(const CanvasFrame& f, ImVec2 at, ImVec2 size) {
    f.draw->AddRectFilled({at.x - 3, at.y - 1}, {at.x + size.x + 3, at.y + size.y + 1}, palette::rgba(20, 24, 28, 200), 3);
}

}  // namespace

EdgeLabelPlaces edgeLabelPlaces(const CanvasFrame& f, int rows, int cols) {
    const float size = canvasTextSize(f, 0.48f);
    EdgeLabelPlaces places;
    places.size = size;
    // Where the letters and numbers sit beside the board, on screen (either may be mirrored).
    const float a = f.at({-0.75f, 0}).x, b = f.at({static_cast<float>(cols) + 0.75f, 0}).x;
    const float halfLetter = size * 0.5f + kPinnedMargin;
    const float halfLine = size * 0.5f + kPinnedMargin;
    places.leftX = std::max(std::min(a, b), f.clipMin.x + halfLetter);
    places.rightX = std::min(std::max(a, b), f.clipMax.x - halfLetter);
    places.leftPinned = places.leftX != std::min(a, b);
    places.rightPinned = places.rightX != std::max(a, b);
    const float top = f.at({0, -0.7f}).y, bottom = f.at({0, static_cast<float>(rows) + 0.7f}).y;
    places.topY = std::max(top, f.clipMin.y + halfLine);
    places.bottomY = std::min(bottom, f.clipMax.y - halfLine);
    places.topPinned = places.topY != top;
    places.bottomPinned = places.bottomY != bottom;
    return places;
}

void drawEdgeLabels(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const EdgeLabelPlaces places = edgeLabelPlaces(f, board.rows, board.cols);
    const float size = places.size;
    if (size <= 0.0f) return;
    ImFont* font = ImGui::GetFont();
    const int step = f.t.holePx >= 18.0f ? 1 : 5;
    for (int r = f.firstRow; r <= f.lastRow; ++r) {
        const std::string name = netcheck::rowName(r);
        const ImVec2 textSize = font->CalcTextSizeA(size, FLT_MAX, 0.0f, name.c_str());
        const float y = f.at({0, static_cast<float>(r) + 0.5f}).y;
        for (auto [x, pinned] : {std::pair{places.leftX, places.leftPinned}, std::pair{places.rightX, places.rightPinned}}) {
            const ImVec2 at = textCentredAt({x, y}, textSize);
            if (pinned) backdrop(f, at, textSize);
            f.draw->AddText(font, size, at, palette::kLabel, name.c_str());
        }
    }
    for (int c = f.firstCol; c <= f.lastCol; ++c) {
        if ((c + 1) % step != 0 && c != 0) continue;
        char text[16];
        std::snprintf(text, sizeof text, "%d", c + 1);
        const ImVec2 textSize = font->CalcTextSizeA(size, FLT_MAX, 0.0f, text);
        const float x = f.at({static_cast<float>(c) + 0.5f, 0}).x;
        for (auto [y, pinned] : {std::pair{places.topY, places.topPinned}, std::pair{places.bottomY, places.bottomPinned}}) {
            const ImVec2 at = textCentredAt({x, y}, textSize);
            if (pinned) backdrop(f, at, textSize);
            f.draw->AddText(font, size, at, pinned ? palette::kLabel : palette::kLabelDim, text);
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

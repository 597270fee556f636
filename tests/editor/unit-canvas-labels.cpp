// Labels on the canvas never cover a pin, a hole in use, a cut mark or another label, on every
// sample, at several zooms, on both sides, with each part hovered in turn (its pin names shown).
// The rectangles are rebuilt here from what the canvas prints (each label's text measured again
// with ImGui's font, centred where it was put) and from the board with the sizes the canvas
// draws things at, not from the placer's own lists.
#include <doctest/doctest.h>

#include <imgui.h>

#include <optional>
#include <string>
#include <vector>

#include "../test_support.hpp"
#include "editor/canvas/canvas_labels.hpp"
#include "netcheck/file/board_file.hpp"

using namespace stripsmith;
using labels::Box;

namespace {

struct ImGuiFonts {
    ImGuiFonts() {
        ImGui::CreateContext();
        unsigned char* pixels = nullptr;
        int w = 0, h = 0;
        ImGui::GetIO().Fonts->GetTexDataAsRGBA32(&pixels, &w, &h);
    }
    ~ImGuiFonts() { ImGui::DestroyContext(); }
    static ImVec2 measure(const std::string& text, float size) {
        return ImGui::GetIO().Fonts->Fonts[0]->CalcTextSizeA(size, FLT_MAX, 0.0f, text.c_str());
    }
};

// What the canvas draws, in pitches (layer_parts.cpp, layer_cuts_links.cpp, layer_offboard.cpp):
constexpr double kPinHalf = 0.2;         // a lead end (0.17 radius) or a chip's pin (0.2 square)
constexpr double kUsedHoleHalf = 0.2;    // a link's or a wire's end dot
constexpr double kCutRingHalf = 0.485;   // a hole cut's ring: 0.44 radius and half its line
constexpr double kCutBarHalfWidth = 0.05, kCutBarHalfHeight = 0.46;

Box square(netcheck::Hole h, double half) {
    return {h.col + 0.5 - half, h.row + 0.5 - half, h.col + 0.5 + half, h.row + 0.5 + half};
}

struct Overlaps {
    int labels = 0, pins = 0, usedHoles = 0, cuts = 0;
    int total() const { return labels + pins + usedHoles + cuts; }
};

int hits(const std::vector<Box>& a, const std::vector<Box>& b) {
    int n = 0;
    for (const Box& x : a)
        for (const Box& y : b) n += x.overlaps(y);
    return n;
}

Overlaps countOverlaps(const netcheck::Board& board, const std::vector<CanvasLabel>& placed,
                       float holePx) {
    std::vector<Box> boxes;
    for (const CanvasLabel& label : placed) {
        const ImVec2 px = ImGuiFonts::measure(label.text, label.sizePx);
        const Box& at = label.placement.box;
        boxes.push_back(labels::boxAround(at.centreX(), at.centreY(),
                                          (px.x + 2 * kLabelPadPx) / holePx, px.y / holePx));
    }
    std::vector<Box> pins, used, cuts;
    for (const auto& part : board.parts)
        for (const auto& pin : part.pins) pins.push_back(square(pin.hole, kPinHalf));
    for (const auto& link : board.links) {
        used.push_back(square(link.from, kUsedHoleHalf));
        used.push_back(square(link.to, kUsedHoleHalf));
    }
    for (const auto& wire : board.wires)
        for (const auto* end : {&wire.from, &wire.to})
            if (end->isHole()) used.push_back(square(*end->hole, kUsedHoleHalf));
    for (const auto& cut : board.cuts) {
        if (cut.kind == netcheck::Cut::Kind::Hole) {
            cuts.push_back(square(cut.hole, kCutRingHalf));
        } else {
            const double x = cut.hole.col + 1.0, y = cut.hole.row + 0.5;
            cuts.push_back({x - kCutBarHalfWidth, y - kCutBarHalfHeight, x + kCutBarHalfWidth,
                            y + kCutBarHalfHeight});
        }
    }
    Overlaps o;
    for (std::size_t i = 0; i < boxes.size(); ++i)
        for (std::size_t j = i + 1; j < boxes.size(); ++j) o.labels += boxes[i].overlaps(boxes[j]);
    o.pins = hits(boxes, pins);
    o.usedHoles = hits(boxes, used);
    o.cuts = hits(boxes, cuts);
    return o;
}

}  // namespace

TEST_CASE("canvas labels: no overlaps on any sample") {
    ImGuiFonts fonts;
    const auto files = test_support::sourceFiles("samples", ".board.json");
    REQUIRE(files.size() >= 10);
    int total = 0, labelsSeen = 0;
    for (const std::string& file : files) {
        const netcheck::Board board = test_support::readSample(file);
        Overlaps sum;
        for (float holePx : {16.0f, 24.0f, 40.0f, 64.0f}) {
            for (bool mirrored : {false, true}) {
                std::vector<std::optional<std::size_t>> hovers{std::nullopt};
                for (std::size_t i = 0; i < board.parts.size(); ++i) hovers.push_back(i);
                for (const auto& hovered : hovers) {
                    CanvasLabelView view;
                    view.holePx = holePx;
                    view.mirrored = mirrored;
                    view.bodies = !mirrored;
                    view.hoveredPart = hovered;
                    const auto placed = canvasLabels(board, view, &ImGuiFonts::measure);
                    const Overlaps o = countOverlaps(board, placed, holePx);
                    sum.labels += o.labels, sum.pins += o.pins;
                    sum.usedHoles += o.usedHoles, sum.cuts += o.cuts;
                    labelsSeen += static_cast<int>(placed.size());
                }
            }
        }
        MESSAGE(file << ": label-label " << sum.labels << ", label-pin " << sum.pins
                     << ", label-used hole " << sum.usedHoles << ", label-cut " << sum.cuts);
        CHECK(sum.total() == 0);
        total += sum.total();
    }
    MESSAGE("overlaps on all samples: " << total << " among " << labelsSeen << " labels");
    CHECK(labelsSeen > 1000);
}

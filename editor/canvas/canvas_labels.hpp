// The text labels the canvas prints on the board (part names, pin names, polarity marks), placed
// by the shared label placer so that none covers a pin, a hole in use, a cut mark or another
// label. Board units; no drawing here, so tests can count overlaps without a window.
#pragma once

#include <cstddef>
#include <functional>
#include <optional>
#include <string>
#include <vector>

#include <imgui.h>

#include "editor/sheet/label_placement.hpp"
#include "netcheck/model/board.hpp"

namespace stripsmith {

/// One canvas label, placed.
struct CanvasLabel {
    enum class Kind { PartName, PinName, Polarity };
    Kind kind = Kind::PartName;
    std::string text;
    float sizePx = 0;                 ///< font size on screen
    double anchorX = 0, anchorY = 0;  ///< what it names, board units
    labels::Placement placement;      ///< board units, component side
};

/// Screen size in pixels of `text` at font size `sizePx` (ImGui's font in the editor).
using MeasureText = std::function<ImVec2(const std::string& text, float sizePx)>;

/// What the canvas shows and at what zoom.
struct CanvasLabelView {
    float holePx = 24;       ///< pixels per hole pitch
    bool mirrored = false;   ///< the copper side: left and right swap on screen
    bool bodies = true;      ///< part bodies are drawn (component side, see-through)
    std::optional<std::size_t> hoveredPart;  ///< its pin names are shown
    /// The part of the board on screen (board units), when not all of it: parts outside get no
    /// labels, so a frame on a huge board costs what is in view.
    std::optional<labels::Box> shown;
};

/// Screen padding around a label's text (each side, pixels): the dark box behind it.
inline constexpr float kLabelPadPx = 2.0f;

/// Screen size of text at a zoom: `pitchFraction` of a pitch, at most 28 px; 0 when under 8 px
/// (too small to read).
float labelTextSize(float holePx, float pitchFraction);

/// The labels of one canvas frame: part names when the zoom allows text, polarity marks of
/// electrolytics and LEDs, pin names of the hovered part (and of transistors when zoomed in).
std::vector<CanvasLabel> canvasLabels(const netcheck::Board& board, const CanvasLabelView& view,
                                      const MeasureText& measure);

}  // namespace stripsmith

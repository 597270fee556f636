// How the document is looked at: zoom, pan, side shown, open panels. Never saved in the board and
// never part of undo.
#pragma once

#include <optional>
#include <string>

#include <imgui.h>

namespace stripsmith {

/// Which face of the board the canvas shows.
enum class Side { Component, Copper, SeeThrough };

struct ViewState {
    float holePx = 24.0f;          ///< zoom: screen pixels per hole pitch
    ImVec2 origin{0, 0};           ///< screen position of the board's top-left (view units)
    bool fitPending = true;        ///< fit the board to the canvas on the next frame
    Side side = Side::Component;
    int uiScale = 1;               ///< 1x or 2x
    int appliedUiScale = 0;        ///< the scale the style was last built for
    bool showCircuit = false;      ///< the Circuit panel is open
    bool showHelp = false;
    bool showBenchVoltages = false;  ///< View > Bench voltages: expected DC voltage per net
    std::optional<int> focusedFinding;  ///< index into errors then warnings
    std::string focusedFindingKey;      ///< what the focused finding said, to follow it across edits
    unsigned focusRevision = 0;         ///< the document revision focusedFinding indexes
    std::optional<int> previewStep;     ///< repair plan step shown ghosted on the board
    ImVec2 canvasMin{0, 0};        ///< the canvas rectangle on screen, last frame
    ImVec2 canvasMax{0, 0};
};

}  // namespace stripsmith

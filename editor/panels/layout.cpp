#include "editor/panels/panels.hpp"

#include <algorithm>

namespace stripsmith {

PanelLayout computeLayout(ImVec2 display, float menuHeight, float uiScale) {
    PanelLayout l;
    l.display = display;
    l.menuHeight = menuHeight;
    l.statusHeight = menuHeight + 6.0f;
    l.leftWidth = std::min(240.0f * uiScale, display.x * 0.25f);
    l.rightWidth = std::min(340.0f * uiScale, display.x * 0.3f);
    l.canvasPos = {l.leftWidth, menuHeight};
    l.canvasSize = {std::max(1.0f, display.x - l.leftWidth - l.rightWidth),
                    std::max(1.0f, display.y - menuHeight - l.statusHeight)};
    return l;
}

bool beginPanel(const char* title, ImVec2 pos, ImVec2 size) {
    ImGui::SetNextWindowPos(pos, ImGuiCond_Always);
    ImGui::SetNextWindowSize(size, ImGuiCond_Always);
    return ImGui::Begin(title, nullptr,
                        ImGuiWindowFlags_NoMove | ImGuiWindowFlags_NoResize | ImGuiWindowFlags_NoCollapse |
                            ImGuiWindowFlags_NoBringToFrontOnFocus);
}

}  // namespace stripsmith

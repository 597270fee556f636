#include "editor/app/test_log.hpp"

#include <cstdio>
#include <cstdlib>

namespace stripsmith {

TestLog TestLog::fromEnvironment() {
    return TestLog(std::getenv("STRIPSMITH_E2E_LOG") != nullptr);
}

bool TestLog::changed(const std::string& topic, const std::string& value) {
    if (!on_) return false;
    std::string& last = last_[topic];
    if (last == value) return false;
    last = value;
    return true;
}

void TestLog::item(const std::string& name) {
    if (!on_) return;
    const ImVec2 a = ImGui::GetItemRectMin(), b = ImGui::GetItemRectMax();
    char where[64];
    std::snprintf(where, sizeof where, "%.0f %.0f", static_cast<double>((a.x + b.x) * 0.5f),
                  static_cast<double>((a.y + b.y) * 0.5f));
    if (changed("item " + name, where)) line("item " + name + " " + where);
}

void TestLog::fit(const std::string& name, ImVec2 areaMin, ImVec2 areaMax) {
    if (!on_) return;
    const ImVec2 a = ImGui::GetItemRectMin(), b = ImGui::GetItemRectMax();
    char where[160];
    std::snprintf(where, sizeof where, "%.0f %.0f %.0f %.0f in %.0f %.0f %.0f %.0f",
                  static_cast<double>(a.x), static_cast<double>(a.y), static_cast<double>(b.x),
                  static_cast<double>(b.y), static_cast<double>(areaMin.x),
                  static_cast<double>(areaMin.y), static_cast<double>(areaMax.x),
                  static_cast<double>(areaMax.y));
    if (changed("fit " + name, where)) line("fit " + name + " " + where);
}

void TestLog::view(ImVec2 a1, float pitch, bool mirrored, int rows, int cols) const {
    char text[160];
    std::snprintf(text, sizeof text, "view A1 %.1f %.1f pitch %.3f mirrored %d rows %d cols %d",
                  static_cast<double>(a1.x), static_cast<double>(a1.y), static_cast<double>(pitch),
                  mirrored ? 1 : 0, rows, cols);
    line(text);
}

void TestLog::frame(unsigned revision, unsigned long keysTaken, unsigned long buttonsTaken) {
    if (!on_) return;
    ++frames_;
    char mouse[32] = "- -";
    if (const ImVec2 at = ImGui::GetIO().MousePos; ImGui::IsMousePosValid(&at))
        std::snprintf(mouse, sizeof mouse, "%.0f %.0f", static_cast<double>(at.x), static_cast<double>(at.y));
    line("frame " + std::to_string(frames_) + " revision " + std::to_string(revision) + " keys " +
         std::to_string(keysTaken) + " buttons " + std::to_string(buttonsTaken) + " mouse " + mouse);
}

void TestLog::line(const std::string& text) const {
    if (on_) std::fprintf(stderr, "STRIPSMITH_E2E %s\n", text.c_str());
}

std::string TestLog::xy(ImVec2 p) {
    char text[64];
    std::snprintf(text, sizeof text, "%.1f %.1f", static_cast<double>(p.x),
                  static_cast<double>(p.y));
    return text;
}

}  // namespace stripsmith

#include "editor/app/look.hpp"

#include <cstdlib>
#include <filesystem>
#include <system_error>

#include <imgui.h>

namespace stripsmith {

namespace {

/// The files the editor cannot start without, relative to the assets folder.
constexpr const char* kRequiredAssets[] = {"fonts/DejaVuSans.ttf"};

/// $STRIPSMITH_ASSETS, or null when it is unset or empty.
const char* assetsFromEnvironment() {
    const char* dir = std::getenv("STRIPSMITH_ASSETS");
    return dir && *dir ? dir : nullptr;
}

}  // namespace

std::string assetsFolder() {
    if (const char* dir = assetsFromEnvironment()) return dir;
    // The kernel's link to the running program: a symlink in PATH is already resolved here.
    std::error_code error;
    const std::filesystem::path program = std::filesystem::read_symlink("/proc/self/exe", error);
    if (error || program.empty()) return {};
    return (program.parent_path() / STRIPSMITH_ASSETS_FROM_BIN).lexically_normal().string();
}

std::string missingAssets() {
    const std::string folder = assetsFolder();
    if (folder.empty()) return "cannot find the assets: the program cannot tell where it is (/proc/self/exe)";
    if (!std::filesystem::path(folder).is_absolute())
        return "STRIPSMITH_ASSETS must be an absolute path, not \"" + folder + "\"";
    for (const char* file : kRequiredAssets) {
        const std::filesystem::path path = std::filesystem::path(folder) / file;
        std::error_code error;
        if (!std::filesystem::is_regular_file(path, error))
            return "missing " + path.string() + " (the assets are looked for in " + folder +
                   (assetsFromEnvironment() ? ", from STRIPSMITH_ASSETS)"
                                            : ", beside the program; reinstall it)");
    }
    return {};
}

// ---- fonts ---------------------------------------------------------------------------------------

const ImWchar* uiGlyphRanges() {
    // Every block the interface's own text draws from (tests/editor/unit-glyphs.cpp checks each
    // character of every string literal in editor/ and netcheck/ against the font built with
    // these): Latin and Latin-1 (degree sign, micro sign, middle dot, multiplication sign), Greek
    // (omega for ohms, mu), general punctuation (en and em dashes, bullet, ellipsis), letterlike
    // symbols (the ohm sign), arrows (the nudge keys, "moved ->"), mathematical operators (minus,
    // less- and greater-or-equal).
    static const ImWchar kRanges[] = {
        0x0020, 0x00FF,  // Basic Latin, Latin-1 Supplement
        0x0370, 0x03FF,  // Greek and Coptic
        0x2000, 0x206F,  // General Punctuation
        0x2100, 0x214F,  // Letterlike Symbols
        0x2190, 0x21FF,  // Arrows
        0x2200, 0x22FF,  // Mathematical Operators
        0,
    };
    return kRanges;
}

ImFont* addUiFont(ImFontAtlas& atlas, const std::string& path, float pixels) {
    ImFontConfig config;
    config.OversampleH = 2;
    return atlas.AddFontFromFileTTF(path.c_str(), pixels, &config, uiGlyphRanges());
}

bool loadFonts() {
    ImGuiIO& io = ImGui::GetIO();
    const std::string path = assetsFolder() + "/fonts/DejaVuSans.ttf";
    if (!std::filesystem::exists(path)) {
        io.Fonts->AddFontDefault();
        return false;
    }
    addUiFont(*io.Fonts, path, look::kFontPixels);
    addUiFont(*io.Fonts, path, look::kFontPixels * 2.0f);
    return true;
}

// ---- the theme -----------------------------------------------------------------------------------
// Stripsmith's own look, all in this one place. Panels are warm light grey "paper" with near-black
// ink: easy on the eyes over long sessions under bench lighting, and screenshots print as they
// look. Colour is kept for meaning: a slate blue marks what is active or chosen (not copper, which
// on the canvas means copper), and the finding colours are dark enough to read on the paper. The
// board itself keeps the trade's colours (copper, IEC 60062 bands, red and black supply wires):
// editor/canvas/palette.hpp.

namespace {

ImVec4 rgb(int r, int g, int b, float a = 1.0f) {
    return {static_cast<float>(r) / 255.0f, static_cast<float>(g) / 255.0f,
            static_cast<float>(b) / 255.0f, a};
}

// Greys from the panel "paper" to the ink, warm (a touch of yellow) so long sessions do not feel
// clinical.
const ImVec4 kPaper = rgb(236, 234, 228);        // panel background
const ImVec4 kPaperDeep = rgb(226, 223, 215);    // menu bar, title bars, headers at rest
const ImVec4 kPaperRaised = rgb(247, 246, 242);  // text fields, popups
const ImVec4 kRule = rgb(190, 186, 176);         // separators and borders
const ImVec4 kControl = rgb(214, 211, 202);      // buttons at rest
const ImVec4 kControlHover = rgb(200, 196, 186);
const ImVec4 kInk = rgb(34, 37, 42);             // text: contrast about 13:1 on the paper
const ImVec4 kInkSoft = rgb(98, 102, 108);       // secondary text: about 5:1, still readable
// The one accent: slate blue for the active tool, chosen rows, checks, sliders, text selection.
const ImVec4 kAccent = rgb(58, 96, 150);
const ImVec4 kAccentSoft = rgb(58, 96, 150, 0.22f);
const ImVec4 kAccentHover = rgb(58, 96, 150, 0.35f);

void colours(ImGuiStyle& style) {
    ImVec4* c = style.Colors;
    c[ImGuiCol_Text] = kInk;
    c[ImGuiCol_TextDisabled] = kInkSoft;
    c[ImGuiCol_WindowBg] = kPaper;
    c[ImGuiCol_ChildBg] = kPaper;
    c[ImGuiCol_PopupBg] = kPaperRaised;
    c[ImGuiCol_MenuBarBg] = kPaperDeep;
    c[ImGuiCol_TitleBg] = c[ImGuiCol_TitleBgActive] = c[ImGuiCol_TitleBgCollapsed] = kPaperDeep;
    c[ImGuiCol_Border] = kRule;
    c[ImGuiCol_BorderShadow] = {0, 0, 0, 0};
    c[ImGuiCol_Separator] = kRule;
    c[ImGuiCol_FrameBg] = kPaperRaised;
    c[ImGuiCol_FrameBgHovered] = rgb(255, 255, 252);
    c[ImGuiCol_FrameBgActive] = rgb(255, 255, 255);
    c[ImGuiCol_Button] = kControl;
    c[ImGuiCol_ButtonHovered] = kControlHover;
    c[ImGuiCol_ButtonActive] = kAccentHover;
    c[ImGuiCol_Header] = kAccentSoft;  // a chosen row (finding, repair step, menu item)
    c[ImGuiCol_HeaderHovered] = kAccentHover;
    c[ImGuiCol_HeaderActive] = kAccentHover;
    c[ImGuiCol_CheckMark] = kAccent;
    c[ImGuiCol_SliderGrab] = kAccent;
    c[ImGuiCol_SliderGrabActive] = kAccent;
    c[ImGuiCol_TextSelectedBg] = kAccentHover;
    c[ImGuiCol_ScrollbarBg] = kPaper;
    c[ImGuiCol_ScrollbarGrab] = kControl;
    c[ImGuiCol_ScrollbarGrabHovered] = kControlHover;
    c[ImGuiCol_ScrollbarGrabActive] = kRule;
    c[ImGuiCol_ModalWindowDimBg] = rgb(34, 37, 42, 0.35f);
    c[ImGuiCol_TableHeaderBg] = kPaperDeep;
    c[ImGuiCol_TableBorderLight] = kRule;
    c[ImGuiCol_TableBorderStrong] = kRule;
}

// Spacing: a little more air than ImGui's defaults so rows are easy to hit and to read; small
// rounding on controls only (panels are fixed tiles, square).
void spacing(ImGuiStyle& style) {
    style.WindowPadding = {10, 10};
    style.FramePadding = {8, 5};
    style.ItemSpacing = {8, 6};
    style.ItemInnerSpacing = {6, 4};
    style.IndentSpacing = 18;
    style.ScrollbarSize = 13;
    style.WindowRounding = 0;
    style.ChildRounding = 0;
    style.PopupRounding = 4;
    style.FrameRounding = 3;
    style.GrabRounding = 3;
    style.ScrollbarRounding = 3;
    style.TabRounding = 3;
    style.WindowBorderSize = 1;
    style.FrameBorderSize = 1;  // fields and buttons keep their edge on the light paper
    style.PopupBorderSize = 1;
}

}  // namespace

void applyLook(int uiScale) {
    ImGuiStyle style;
    ImGui::StyleColorsLight(&style);
    colours(style);
    spacing(style);
    style.ScaleAllSizes(static_cast<float>(uiScale));
    ImGui::GetStyle() = style;
    ImGuiIO& io = ImGui::GetIO();
    if (io.Fonts->Fonts.Size >= 2) io.FontDefault = io.Fonts->Fonts[uiScale >= 2 ? 1 : 0];
}

}  // namespace stripsmith

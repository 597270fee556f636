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

bool loadFonts() {
    ImGuiIO& io = ImGui::GetIO();
    const std::string path = assetsFolder() + "/fonts/DejaVuSans.ttf";
    if (!std::filesystem::exists(path)) {
        io.Fonts->AddFontDefault();
        return false;
    }
    ImFontConfig config;
    config.OversampleH = 2;
    io.Fonts->AddFontFromFileTTF(path.c_str(), 15.0f, &config, io.Fonts->GetGlyphRangesDefault());
    io.Fonts->AddFontFromFileTTF(path.c_str(), 30.0f, &config, io.Fonts->GetGlyphRangesDefault());
    return true;
}

void applyLook(int uiScale) {
    ImGuiStyle style;
    ImGui::StyleColorsDark(&style);
    style.WindowRounding = 0.0f;
    style.FrameRounding = 4.0f;
    style.GrabRounding = 4.0f;
    style.WindowBorderSize = 1.0f;
    style.FramePadding = {7, 4};
    style.ItemSpacing = {8, 6};
    ImVec4* c = style.Colors;
    const ImVec4 ink{0.11f, 0.125f, 0.15f, 1.0f};
    c[ImGuiCol_WindowBg] = ink;
    c[ImGuiCol_ChildBg] = {0.09f, 0.10f, 0.12f, 1.0f};
    c[ImGuiCol_PopupBg] = {0.13f, 0.145f, 0.17f, 0.98f};
    c[ImGuiCol_MenuBarBg] = {0.15f, 0.165f, 0.19f, 1.0f};
    c[ImGuiCol_TitleBg] = c[ImGuiCol_TitleBgActive] = {0.16f, 0.18f, 0.21f, 1.0f};
    c[ImGuiCol_Text] = {0.93f, 0.94f, 0.95f, 1.0f};
    c[ImGuiCol_TextDisabled] = {0.60f, 0.63f, 0.67f, 1.0f};
    // Copper accents for active things.
    const ImVec4 copper{0.87f, 0.56f, 0.29f, 1.0f};
    c[ImGuiCol_Button] = {0.22f, 0.25f, 0.29f, 1.0f};
    c[ImGuiCol_ButtonHovered] = {0.32f, 0.36f, 0.41f, 1.0f};
    c[ImGuiCol_ButtonActive] = {0.68f, 0.42f, 0.20f, 1.0f};
    c[ImGuiCol_Header] = {0.25f, 0.28f, 0.33f, 1.0f};
    c[ImGuiCol_HeaderHovered] = {0.34f, 0.37f, 0.43f, 1.0f};
    c[ImGuiCol_HeaderActive] = {0.68f, 0.42f, 0.20f, 1.0f};
    c[ImGuiCol_FrameBg] = {0.17f, 0.19f, 0.22f, 1.0f};
    c[ImGuiCol_FrameBgHovered] = {0.23f, 0.26f, 0.30f, 1.0f};
    c[ImGuiCol_CheckMark] = copper;
    c[ImGuiCol_SliderGrab] = copper;
    c[ImGuiCol_Separator] = {0.28f, 0.30f, 0.34f, 1.0f};
    style.ScaleAllSizes(static_cast<float>(uiScale));
    ImGui::GetStyle() = style;
    ImGuiIO& io = ImGui::GetIO();
    if (io.Fonts->Fonts.Size >= 2) io.FontDefault = io.Fonts->Fonts[uiScale >= 2 ? 1 : 0];
}

}  // namespace stripsmith

// The editor's look: fonts from assets/ and Stripsmith's own light theme, at 1x or 2x.
#pragma once

#include <string>

#include <imgui.h>

namespace stripsmith {

/// The assets folder (fonts): $STRIPSMITH_ASSETS when set (an absolute path), else
/// share/stripsmith beside the program's own folder (bin/../share/stripsmith), which holds in the
/// build tree (the build copies assets/ there) and in an install alike. Never the current
/// directory. Empty when the program cannot tell where it is.
std::string assetsFolder();

/// Empty when every asset the editor needs is in assetsFolder(); else one message naming the
/// first missing file and where it was looked for.
std::string missingAssets();

/// Colours the panels use for meaning, on the theme's light paper (editor/app/look.cpp has the
/// rest of the theme and why).
namespace look {
inline constexpr float kFontPixels = 15.0f;                        ///< body text at 1x
inline const ImVec4 kErrorText{0.70f, 0.13f, 0.10f, 1.0f};     ///< errors: dark red
inline const ImVec4 kWarningText{0.58f, 0.36f, 0.0f, 1.0f};    ///< warnings: dark amber
inline const ImVec4 kGoodText{0.10f, 0.46f, 0.22f, 1.0f};      ///< all clear: dark green
inline const ImVec4 kPlanText{0.16f, 0.33f, 0.58f, 1.0f};      ///< repair plan: the accent
}  // namespace look

/// The Unicode blocks the interface's text uses, for the font atlas (zero-terminated pairs).
const ImWchar* uiGlyphRanges();

/// Adds the UI font at `pixels` with uiGlyphRanges() to an atlas (before it is built).
ImFont* addUiFont(ImFontAtlas& atlas, const std::string& path, float pixels);

/// Adds the UI font at 1x and 2x to ImGui's atlas (before the renderer builds it). Returns false
/// (and keeps ImGui's built-in font) when the font file is missing.
bool loadFonts();

/// Applies the style for a UI scale (1 or 2) and picks the matching font.
void applyLook(int uiScale);

}  // namespace stripsmith

// The editor's look: fonts from assets/ and a calm, high-contrast style, at 1x or 2x.
#pragma once

#include <string>

namespace stripsmith {

/// The assets folder: $STRIPSMITH_ASSETS when set, else the source tree's assets/.
std::string assetsFolder();

/// Adds the UI font at 1x and 2x to ImGui's atlas (before the renderer builds it). Returns false
/// (and keeps ImGui's built-in font) when the font file is missing.
bool loadFonts();

/// Applies the style for a UI scale (1 or 2) and picks the matching font.
void applyLook(int uiScale);

}  // namespace stripsmith

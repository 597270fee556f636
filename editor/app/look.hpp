// The editor's look: fonts from assets/ and a calm, high-contrast style, at 1x or 2x.
#pragma once

#include <string>

namespace stripsmith {

/// The assets folder (fonts): $STRIPSMITH_ASSETS when set (an absolute path), else
/// share/stripsmith beside the program's own folder (bin/../share/stripsmith), which holds in the
/// build tree (the build copies assets/ there) and in an install alike. Never the current
/// directory. Empty when the program cannot tell where it is.
std::string assetsFolder();

/// Empty when every asset the editor needs is in assetsFolder(); else one message naming the
/// first missing file and where it was looked for.
std::string missingAssets();

/// Adds the UI font at 1x and 2x to ImGui's atlas (before the renderer builds it). Returns false
/// (and keeps ImGui's built-in font) when the font file is missing.
bool loadFonts();

/// Applies the style for a UI scale (1 or 2) and picks the matching font.
void applyLook(int uiScale);

}  // namespace stripsmith

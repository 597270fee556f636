// The editor's colours: a calm, high-contrast bench look (dark surround, warm board, bright copper).
#pragma once

#include <imgui.h>

namespace stripsmith::palette {

constexpr ImU32 rgba(int r, int g, int b, int a = 255) {
    return IM_COL32(r, g, b, a);
}

inline constexpr ImU32 kSurround = rgba(28, 32, 38);
inline constexpr ImU32 kBoardComponent = rgba(214, 190, 146);   // plain side of the board
inline constexpr ImU32 kBoardCopperSide = rgba(120, 84, 52);    // substrate seen from below
inline constexpr ImU32 kBoardEdge = rgba(90, 66, 40);
inline constexpr ImU32 kStripFaint = rgba(196, 168, 120);       // strips glimpsed from above
inline constexpr ImU32 kCopper = rgba(222, 142, 74);
inline constexpr ImU32 kCopperSeeThrough = rgba(222, 142, 74, 150);
inline constexpr ImU32 kHole = rgba(40, 32, 26);
inline constexpr ImU32 kHoleRing = rgba(150, 120, 84);
inline constexpr ImU32 kLabel = rgba(210, 214, 220);
inline constexpr ImU32 kLabelDim = rgba(140, 146, 156);
inline constexpr ImU32 kCutHole = rgba(245, 245, 245);
inline constexpr ImU32 kCutMark = rgba(214, 40, 40);
inline constexpr ImU32 kLinkWire = rgba(178, 186, 194);
inline constexpr ImU32 kLinkWireEdge = rgba(70, 76, 84);
inline constexpr ImU32 kLinkSleeve = rgba(46, 140, 92, 235);  // green sleeving over an insulated link
inline constexpr ImU32 kLead = rgba(160, 166, 172);
inline constexpr ImU32 kSelection = rgba(60, 170, 255);
inline constexpr ImU32 kHover = rgba(255, 236, 90, 110);
inline constexpr ImU32 kHoverEdge = rgba(255, 236, 90, 230);
inline constexpr ImU32 kError = rgba(240, 60, 60);
inline constexpr ImU32 kErrorFill = rgba(240, 60, 60, 70);
inline constexpr ImU32 kWarning = rgba(250, 180, 40);
inline constexpr ImU32 kSuggestion = rgba(60, 220, 120);
inline constexpr ImU32 kGhost = rgba(60, 170, 255, 140);
inline constexpr ImU32 kText = rgba(20, 20, 20);
inline constexpr ImU32 kTextLight = rgba(245, 245, 245);
inline constexpr ImU32 kOffboardBody = rgba(58, 64, 74);
inline constexpr ImU32 kOffboardEdge = rgba(150, 158, 170);
inline constexpr ImU32 kLug = rgba(200, 200, 190);

/// Wire colour from the maker's word ("red", "black", "yellow" ...); unknown words get light grey.
ImU32 wireColour(const char* name);

/// The island palette for telling pieces apart (open findings): index wraps around.
ImU32 pieceColour(int index);

}  // namespace stripsmith::palette

// Text from files made safe to print: a value holding ESC sequences must not retitle or clear
// the terminal that shows a report, nor vanish from a printed sheet.
#pragma once

#include <string>
#include <string_view>

namespace netcheck {

/// `text` with every control character written out as an escape: C0 controls and DEL as
/// `\x1b`, C1 controls as `\u009b`, bytes that are not UTF-8 as `\xff`. All other text,
/// backslashes included, is unchanged, so ordinary names print as they are.
std::string escapeControls(std::string_view text);

/// The same for text of several lines: line breaks are kept, everything else escaped.
std::string escapeControlsKeepingLines(std::string_view text);

}  // namespace netcheck

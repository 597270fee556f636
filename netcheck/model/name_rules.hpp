// What refs, kinds and values may hold. A ref names a part on the schematic and in every list
// of the build sheet: it has no blanks (a maker could not tell "R 1" from "R1"), no control
// characters, and refs that differ only in case name the same part.
#pragma once

#include <optional>
#include <string>
#include <string_view>

namespace netcheck {

/// What is wrong with `ref` as a reference designator, or nullopt when it is usable: "is empty",
/// "may not contain blanks (...)" (spaces, tabs, no-break and zero-width spaces), "holds a
/// control character (U+001B)". The caller puts the ref in front.
std::optional<std::string> refProblem(std::string_view ref);

/// What is wrong with a kind, value or other name in a document, or nullopt: only control
/// characters are refused, tabs and line breaks included ("holds a control character (U+0009)").
std::optional<std::string> textProblem(std::string_view text);

/// The form under which two refs are the same part: Q1 and q1 are one part on any schematic.
std::string refIdentity(std::string_view ref);

}  // namespace netcheck

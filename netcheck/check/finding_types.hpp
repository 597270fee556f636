// The kinds of finding, and the one table of their ids, severities and meanings.
#pragma once

#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace netcheck {

enum class Severity { Error, Warning };

/// Every kind of finding. Its id, severity and meaning are in one table (finding_types.cpp),
/// used by the reports, the editor, the sheet and the README.
enum class FindingType {
    Short,
    Open,
    MissingPart,
    ExtraPart,
    PinMismatch,
    ValueMismatch,
    ReversedPart,
    SharedHole,
    PinOnCut,
    ValueDiffers,
    PotReversed,
    DanglingLead,
    LinkOverLead,
    LinksTouch,
    LinksUnchecked,
    Trim,
};

/// One row of the table of finding types.
struct FindingTypeInfo {
    FindingType type;
    std::string_view id;  ///< as written in reports, e.g. "pin-on-cut"
    Severity severity;
    std::string_view meaning;  ///< one line, for the docs and the editor's tooltips
    std::string_view fields;   ///< the JSON report's fields for this type, in Markdown
};

/// The whole table, in report order (errors first).
std::span<const FindingTypeInfo> findingTypes();
const FindingTypeInfo& findingTypeInfo(FindingType type);
/// The table as the README prints it (Markdown, one row per type).
std::string findingTypesMarkdown();
/// "short", "pin-on-cut" ...
std::string_view findingId(FindingType type);
/// The type of an id; nullopt for an unknown one.
std::optional<FindingType> findingTypeOfId(std::string_view id);

}  // namespace netcheck

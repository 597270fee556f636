// The one table of finding types. The README's table of findings is this table as Markdown, checked
// by tests/unit-finding-types.cpp.
#include <algorithm>
#include <array>

#include "netcheck/check/finding_types.hpp"

namespace netcheck {

namespace {

using enum FindingType;
constexpr Severity E = Severity::Error;
constexpr Severity W = Severity::Warning;

constexpr std::array kTable{
    FindingTypeInfo{Short, "short", E, "one copper island holds pins of two or more nets",
                    "`nets` (sorted), `path` (shortest copper path between two of them), `cut` "
                    "(one cut that separates them without opening anything, when one exists)"},
    FindingTypeInfo{Open, "open", E, "one net's pins lie in two or more islands",
                    "`net`, `pieces` (pins of each piece), `links` (links that join them through "
                    "free holes)"},
    FindingTypeInfo{MissingPart, "missing-part", E, "a ref in the circuit but not on the board",
                    "`ref`"},
    FindingTypeInfo{ExtraPart, "extra-part", E, "a ref on the board that the circuit never names",
                    "`ref`"},
    FindingTypeInfo{PinMismatch, "pin-mismatch", E,
                    "the part's pin names differ from the circuit's use of them", "`ref`"},
    FindingTypeInfo{ValueMismatch, "value-mismatch", E,
                    "a resistance, capacitance, inductance or pot value differs (compared "
                    "numerically)",
                    "`ref`"},
    FindingTypeInfo{ReversedPart, "reversed-part", E,
                    "a polarised part (electrolytic, diode, LED, transistor) looks turned round",
                    "`ref`"},
    FindingTypeInfo{SharedHole, "shared-hole", E, "two leads in one hole (pins, link and wire ends)",
                    "`hole`"},
    FindingTypeInfo{PinOnCut, "pin-on-cut", E, "a lead in a hole whose copper was cut away",
                    "`hole`"},
    FindingTypeInfo{ValueDiffers, "value-differs", W,
                    "the type number of a semiconductor or IC differs (compared as text)", "`ref`"},
    FindingTypeInfo{PotReversed, "pot-reversed", W,
                    "a pot's end lugs 1 and 3 are swapped: the control works backwards", "`ref`"},
    FindingTypeInfo{DanglingLead, "dangling-lead", W, "a lead whose island holds nothing else",
                    "`hole`"},
    FindingTypeInfo{LinkOverLead, "link-over-lead", W,
                    "a bare component-side link lies across a hole holding a lead (their centres "
                    "come within 0.6 mm, so they touch)",
                    "`holes`: the link's ends, then the holes passed over"},
    FindingTypeInfo{LinksTouch, "links-touch", W, "two bare links cross", "`holes`: the four ends"},
    FindingTypeInfo{LinksUnchecked, "links-unchecked", W,
                    "so many long links that checking their contacts was given up: check them by "
                    "eye",
                    "none beyond `message`"},
    FindingTypeInfo{Trim, "trim", W,
                    "unused rows or columns at the edges: the trimmed size in holes and mm",
                    "`holes`: the corners of the used area"},
};

}  // namespace

std::span<const FindingTypeInfo> findingTypes() { return kTable; }

std::string findingTypesMarkdown() {
    std::string text = "| type | severity | meaning | fields |\n|---|---|---|---|\n";
    for (const FindingTypeInfo& info : kTable) {
        text += "| `" + std::string(info.id) + "` | " +
                (info.severity == Severity::Error ? "error" : "warning") + " | " +
                std::string(info.meaning) + " | " + std::string(info.fields) + " |\n";
    }
    return text;
}

const FindingTypeInfo& findingTypeInfo(FindingType type) {
    return kTable[static_cast<std::size_t>(type)];
}

std::string_view findingId(FindingType type) { return findingTypeInfo(type).id; }

std::optional<FindingType> findingTypeOfId(std::string_view id) {
    const auto it = std::find_if(kTable.begin(), kTable.end(),
                                 [&](const FindingTypeInfo& info) { return info.id == id; });
    if (it == kTable.end()) return std::nullopt;
    return it->type;
}

static_assert(std::is_sorted(kTable.begin(), kTable.end(),
                             [](const FindingTypeInfo& a, const FindingTypeInfo& b) {
                                 return a.type < b.type;
                             }),
              "the table is indexed by FindingType: keep its rows in the enum's order");

}  // namespace netcheck

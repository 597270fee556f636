// The one table of finding types. The README's tables of errors and warnings are checked against
// it (tests/unit-finding-types.cpp), and `netcheck --finding-types` prints it.
#include <algorithm>
#include <array>

#include "netcheck/check/check_report.hpp"

namespace netcheck {

namespace {

using enum FindingType;
constexpr Severity E = Severity::Error;
constexpr Severity W = Severity::Warning;

constexpr std::array kTable{
    FindingTypeInfo{Short, "short", E, "one copper island holds pins of two or more nets"},
    FindingTypeInfo{Open, "open", E, "one net's pins lie in two or more islands"},
    FindingTypeInfo{MissingPart, "missing-part", E, "a ref in the circuit but not on the board"},
    FindingTypeInfo{ExtraPart, "extra-part", E, "a ref on the board but not in the circuit"},
    FindingTypeInfo{PinMismatch, "pin-mismatch", E,
                    "the part's pin names differ from the circuit's use of them"},
    FindingTypeInfo{ValueMismatch, "value-mismatch", E,
                    "a resistance, capacitance, inductance or pot value differs (compared "
                    "numerically)"},
    FindingTypeInfo{ReversedPart, "reversed-part", E,
                    "a polarised part (electrolytic, diode, LED, transistor) looks turned round"},
    FindingTypeInfo{SharedHole, "shared-hole", E,
                    "two leads in one hole (pins, link and wire ends)"},
    FindingTypeInfo{PinOnCut, "pin-on-cut", E, "a lead in a hole whose copper was cut away"},
    FindingTypeInfo{ValueDiffers, "value-differs", W,
                    "the type number of a semiconductor or IC differs (compared as text)"},
    FindingTypeInfo{PotReversed, "pot-reversed", W,
                    "a pot's end lugs 1 and 3 are swapped: the control works backwards"},
    FindingTypeInfo{DanglingLead, "dangling-lead", W, "a lead whose island holds nothing else"},
    FindingTypeInfo{LinkOverLead, "link-over-lead", W,
                    "a bare component-side link lies across a hole holding a lead"},
    FindingTypeInfo{LinksTouch, "links-touch", W, "two bare links cross"},
    FindingTypeInfo{LinksUnchecked, "links-unchecked", W,
                    "so many long links that checking their contacts was given up"},
    FindingTypeInfo{Trim, "trim", W, "unused rows or columns at the edges of the board"},
};

}  // namespace

std::span<const FindingTypeInfo> findingTypes() { return kTable; }

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

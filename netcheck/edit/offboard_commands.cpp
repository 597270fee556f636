#include "netcheck/edit/offboard_commands.hpp"

namespace netcheck::edit {

std::string OffboardList::changeLabel(const OffboardPart& before, const OffboardPart& after) {
    if (before.ref != after.ref) return "Rename " + before.ref + " to " + after.ref;
    const bool valueOnly = before.kind == after.kind && before.pins == after.pins &&
                           before.extra == after.extra && before.value != after.value;
    if (valueOnly) return "Set " + before.ref + " to " + after.value;
    return "Edit " + before.ref;
}

}  // namespace netcheck::edit

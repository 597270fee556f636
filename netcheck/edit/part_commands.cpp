#include "netcheck/edit/part_commands.hpp"

#include <algorithm>

namespace netcheck::edit {

namespace {

// Squared distances between every pair of pins, sorted: equal for a part and any rotation or
// mirror of it, different after a stretch.
std::vector<long long> pinSpacings(const Part& part) {
    std::vector<long long> spacings;
    for (std::size_t i = 0; i < part.pins.size(); ++i) {
        for (std::size_t j = i + 1; j < part.pins.size(); ++j) {
            const long long dr = part.pins[i].hole.row - part.pins[j].hole.row;
            const long long dc = part.pins[i].hole.col - part.pins[j].hole.col;
            spacings.push_back(dr * dr + dc * dc);
        }
    }
    std::sort(spacings.begin(), spacings.end());
    return spacings;
}

bool pinNamesEqual(const Part& a, const Part& b) {
    return std::equal(a.pins.begin(), a.pins.end(), b.pins.begin(), b.pins.end(),
                      [](const Pin& x, const Pin& y) { return x.name == y.name; });
}

// True when every pin moved by the same offset.
bool isShift(const Part& before, const Part& after) {
    if (before.pins.size() != after.pins.size() || before.pins.empty()) return false;
    const int dr = after.pins[0].hole.row - before.pins[0].hole.row;
    const int dc = after.pins[0].hole.col - before.pins[0].hole.col;
    for (std::size_t i = 0; i < before.pins.size(); ++i) {
        if (after.pins[i].hole.row - before.pins[i].hole.row != dr ||
            after.pins[i].hole.col - before.pins[i].hole.col != dc) {
            return false;
        }
    }
    return true;
}

std::string placementLabel(const Part& before, const Part& after) {
    if (isShift(before, after)) return "Move " + before.ref;
    if (pinSpacings(before) == pinSpacings(after)) return "Rotate " + before.ref;
    return "Stretch " + before.ref;
}

}  // namespace

std::string PartList::addLabel(const Part& part) { return "Add " + part.ref; }

std::string PartList::removeLabel(const Part& part) { return "Remove " + part.ref; }

std::string PartList::changeLabel(const Part& before, const Part& after) {
    if (before.ref != after.ref) return "Rename " + before.ref + " to " + after.ref;
    // Drawing hints in `extra` (rotation, standing) may change along with the placement.
    const bool placementOnly = before.kind == after.kind && before.value == after.value &&
                               pinNamesEqual(before, after) && before.pins != after.pins;
    if (placementOnly) return placementLabel(before, after);
    const bool pinoutOnly = before.kind == after.kind && before.value == after.value &&
                            before.pins.size() == after.pins.size() && !pinNamesEqual(before, after);
    if (pinoutOnly) return "Set pinout of " + before.ref;
    const bool valueOnly = before.kind == after.kind && before.extra == after.extra &&
                           before.pins == after.pins && before.value != after.value;
    if (valueOnly) return "Set " + before.ref + " to " + after.value;
    return "Edit " + before.ref;
}

std::vector<Hole> PartList::holes(const Part& part) {
    std::vector<Hole> holes;
    holes.reserve(part.pins.size());
    for (const Pin& pin : part.pins) holes.push_back(pin.hole);
    return holes;
}

}  // namespace netcheck::edit

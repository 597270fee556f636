#include "netcheck/edit/wire_commands.hpp"

#include "netcheck/edit/label_text.hpp"

namespace netcheck::edit {

namespace {

std::string wireName(const Wire& wire) { return joinedName(wire.from.name(), wire.to.name()); }

}  // namespace

std::string WireList::addLabel(const Wire& wire) { return "Add wire " + wireName(wire); }

std::string WireList::removeLabel(const Wire& wire) { return "Remove wire " + wireName(wire); }

std::string WireList::changeLabel(const Wire& before, const Wire& after) {
    if (before.from != after.from || before.to != after.to) return "Move wire " + wireName(before);
    if (before.color != after.color && before.extra == after.extra) {
        if (after.color.empty()) return "Clear colour of wire " + wireName(before);
        return "Colour wire " + wireName(before) + " " + after.color;
    }
    return "Edit wire " + wireName(before);
}

std::vector<Hole> WireList::holes(const Wire& wire) {
    std::vector<Hole> holes;
    if (wire.from.hole) holes.push_back(*wire.from.hole);
    if (wire.to.hole) holes.push_back(*wire.to.hole);
    return holes;
}

}  // namespace netcheck::edit

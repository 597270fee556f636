#include "netcheck/edit/link_commands.hpp"

#include "netcheck/edit/label_text.hpp"

namespace netcheck::edit {

namespace {

// "A1–C1", with the dash the edit labels use.
std::string linkLabel(const Link& link) {
    return joinedName(holeName(link.from), holeName(link.to));
}

}  // namespace

std::string LinkList::addLabel(const Link& link) { return "Add link " + linkLabel(link); }

std::string LinkList::removeLabel(const Link& link) { return "Remove link " + linkLabel(link); }

std::vector<Hole> LinkList::holes(const Link& link) { return {link.from, link.to}; }

std::string LinkList::changeLabel(const Link& before, const Link& after) {
    const bool moved = before.from != after.from || before.to != after.to;
    return (moved ? "Move link " : "Edit link ") + linkLabel(before);
}

}  // namespace netcheck::edit

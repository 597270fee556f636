#include "editor/tools/ref_names.hpp"

#include <cctype>
#include <set>

#include "netcheck/model/part_kinds.hpp"

namespace stripsmith {

std::string refPrefix(std::string_view kind) {
    // One rule, from the kind table: a new part is named by what it is (an LED is a diode, D).
    if (const netcheck::PartKind* known = netcheck::findPartKind(kind); known && !known->refPrefix.empty())
        return std::string(known->refPrefix);
    return "X";  // a kind the table does not know: a generic part
}

std::string prefixOf(std::string_view ref) {
    std::size_t end = ref.size();
    while (end > 0 && std::isdigit(static_cast<unsigned char>(ref[end - 1]))) --end;
    return std::string(ref.substr(0, end));
}

bool refTaken(const netcheck::Board& board, std::string_view ref, std::string_view except) {
    if (ref == except) return false;
    for (const auto& p : board.parts)
        if (p.ref == ref) return true;
    for (const auto& p : board.offboard)
        if (p.ref == ref) return true;
    return false;
}

std::string nextFreeRef(const netcheck::Board& board, std::string_view prefix) {
    std::set<std::string> used;
    for (const auto& p : board.parts) used.insert(p.ref);
    for (const auto& p : board.offboard) used.insert(p.ref);
    if (board.circuit)
        for (const auto& [ref, part] : board.circuit->parts) used.insert(ref);
    for (int n = 1;; ++n) {
        std::string ref = std::string(prefix) + std::to_string(n);
        if (!used.count(ref)) return ref;
    }
}

}  // namespace stripsmith

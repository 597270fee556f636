#include "editor/tools/ref_names.hpp"

#include <array>
#include <cctype>
#include <set>

namespace stripsmith {

std::string refPrefix(std::string_view kind) {
    struct Entry { std::string_view kind, prefix; };
    static constexpr std::array<Entry, 24> kPrefixes{{
        {"resistor", "R"}, {"capacitor", "C"}, {"electrolytic", "C"}, {"inductor", "L"},
        {"diode", "D"}, {"zener", "D"}, {"led", "LED"}, {"bjt", "Q"}, {"jfet", "Q"},
        {"mosfet", "Q"}, {"regulator", "U"}, {"ic", "U"}, {"trimmer", "RV"}, {"header", "J"},
        {"crystal", "X"}, {"fuse", "F"}, {"wire-terminal", "TB"}, {"pot", "VR"}, {"jack", "J"},
        {"mono-jack", "J"}, {"stereo-jack", "J"}, {"switch", "SW"}, {"footswitch", "SW"},
        {"dc-jack", "J"},
    }};
    for (const Entry& e : kPrefixes)
        if (e.kind == kind) return std::string(e.prefix);
    if (kind == "battery") return "BT";
    if (kind == "panel-led") return "LED";
    return "X";
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

#include "sheet_content.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <map>
#include <tuple>

#include "netcheck/model/board_size.hpp"
#include "netcheck/model/colour_code.hpp"
#include "netcheck/model/part_kinds.hpp"
#include "netcheck/model/value.hpp"
#include "netcheck/model/wording.hpp"

namespace sheet {

using netcheck::Board;
using netcheck::Cut;

namespace {

std::string kindLabel(const std::string& kind) {
    const netcheck::PartKind* known = netcheck::findPartKind(kind);
    return known ? std::string(known->label) : kind;
}

/// A string member of a part's extra keys, empty when absent or not a string.
std::string extraText(const nlohmann::json& extra, const char* key) {
    auto it = extra.find(key);
    return it != extra.end() && it->is_string() ? it->get<std::string>() : std::string();
}

double tolerancePercent(const nlohmann::json& extra) {
    auto it = extra.find("tolerance");
    if (it != extra.end() && it->is_number()) return it->get<double>();
    if (it != extra.end() && it->is_string()) {
        std::string text = it->get<std::string>();
        double value = 0;
        if (std::sscanf(text.c_str(), "%lf", &value) == 1 && value > 0) return value;
    }
    return 5.0;  // the common tolerance of through-hole carbon film resistors
}

/// Notes that tell the maker something the value alone does not.
std::string partNotes(const std::string& kind, const std::string& value,
                      const nlohmann::json& extra, bool offboard) {
    std::vector<std::string> notes;
    if (kind == "resistor") {
        std::string bands = colourBandsText(value, tolerancePercent(extra));
        if (!bands.empty()) notes.push_back("bands: " + bands);
    }
    auto quantity = netcheck::parseQuantity(value);
    std::string taper = extraText(extra, "taper");
    if (taper.empty() && quantity && (kind == "pot" || kind == "trimmer")) taper = quantity->taper;
    if (!taper.empty()) notes.push_back("taper " + taper);
    std::string pinout = extraText(extra, "pinout");
    if (!pinout.empty()) notes.push_back("pinout " + pinout + " (check the datasheet)");
    std::string note = extraText(extra, "note");
    if (!note.empty()) notes.push_back(note);
    if (offboard) notes.push_back("off-board");
    return netcheck::joined(notes, "; ");
}

/// Kinds in the order the BOM lists them (the kinds table order), unknown kinds last.
int kindOrder(const std::string& kind) {
    auto kinds = netcheck::partKinds();
    for (std::size_t i = 0; i < kinds.size(); ++i) {
        if (kinds[i].name == kind) return static_cast<int>(i);
    }
    return static_cast<int>(kinds.size());
}

/// Sort key of a value: by magnitude when it is a quantity, else by text.
std::tuple<int, double, std::string> valueKey(const std::string& value) {
    auto quantity = netcheck::parseQuantity(value);
    if (quantity) return {0, quantity->magnitude, quantity->taper};
    return {1, 0.0, value};
}

/// Height class for the assembly order (common practice: lowest parts first).
int heightRank(const std::string& kind) {
    static const std::map<std::string, int> kRanks = {
        {"resistor", 0},  {"diode", 0},       {"zener", 0},   {"inductor", 0}, {"fuse", 0},
        {"ic", 1},        {"capacitor", 1},   {"crystal", 1}, {"header", 1},   {"wire-terminal", 2},
        {"bjt", 2},       {"jfet", 2},        {"mosfet", 2},  {"led", 2},      {"trimmer", 2},
        {"regulator", 2}, {"electrolytic", 3}};
    auto it = kRanks.find(kind);
    return it == kRanks.end() ? 2 : it->second;
}

std::string countText(std::size_t count, const char* one, const char* many) {
    return std::to_string(count) + " " + (count == 1 ? one : many);
}

}  // namespace

std::vector<Cut> numberedCuts(const Board& board) {
    std::vector<Cut> cuts = board.cuts;
    std::sort(cuts.begin(), cuts.end());
    return cuts;
}

int fromLeftComponent(const Board&, int col) {
    return col + 1;
}
int fromLeftCopper(const Board& board, int col) {
    return board.cols - col;
}

bool refLess(const std::string& a, const std::string& b) {
    auto split = [](const std::string& ref) {
        std::size_t digits = ref.size();
        while (digits > 0 && std::isdigit(static_cast<unsigned char>(ref[digits - 1]))) --digits;
        std::string number = ref.substr(digits);
        long long n = number.empty() || number.size() > 15 ? -1 : std::stoll(number);
        return std::make_tuple(ref.substr(0, digits), n, ref);
    };
    return split(a) < split(b);
}

std::string colourBandsText(const std::string& value, double tolerancePercent) {
    auto quantity = netcheck::parseQuantity(value);
    if (!quantity || quantity->magnitude <= 0) return {};
    auto bands = netcheck::resistorBands(quantity->magnitude, tolerancePercent);
    if (!bands) return {};
    std::vector<std::string> names;
    for (netcheck::BandColour band : *bands) names.emplace_back(netcheck::bandName(band));
    return netcheck::joined(names, " ");
}

std::vector<BomLine> billOfMaterials(const Board& board) {
    struct Entry {
        std::string ref, kind, value, notes;
    };
    std::vector<Entry> entries;
    for (const auto& part : board.parts) {
        entries.push_back(
            {part.ref, part.kind, part.value, partNotes(part.kind, part.value, part.extra, false)});
    }
    for (const auto& part : board.offboard) {
        entries.push_back(
            {part.ref, part.kind, part.value, partNotes(part.kind, part.value, part.extra, true)});
    }
    std::vector<BomLine> lines;
    for (const Entry& entry : entries) {
        auto same = std::find_if(lines.begin(), lines.end(), [&](const BomLine& line) {
            return line.kind == entry.kind && netcheck::sameValue(line.value, entry.value) &&
                   line.notes == entry.notes;
        });
        if (same == lines.end()) {
            lines.push_back({0, {}, entry.value, entry.kind, kindLabel(entry.kind), entry.notes});
            same = lines.end() - 1;
        }
        same->quantity += 1;
        same->refs.push_back(entry.ref);
    }
    for (BomLine& line : lines) std::sort(line.refs.begin(), line.refs.end(), refLess);
    std::sort(lines.begin(), lines.end(), [](const BomLine& a, const BomLine& b) {
        return std::make_tuple(kindOrder(a.kind), a.kind, valueKey(a.value), a.notes) <
               std::make_tuple(kindOrder(b.kind), b.kind, valueKey(b.value), b.notes);
    });
    return lines;
}

std::vector<WiringLine> wiringList(const Board& board) {
    std::vector<WiringLine> lines;
    for (const auto& wire : board.wires) {
        std::vector<std::string> notes;
        for (const auto* end : {&wire.from, &wire.to}) {
            if (end->isHole()) continue;
            const auto* part = board.findOffboard(end->lug.ref);
            std::string what = end->lug.ref;
            if (part)
                what +=
                    " " + kindLabel(part->kind) + (part->value.empty() ? "" : " ") + part->value;
            notes.push_back(what + ", lug " + end->lug.pin);
        }
        lines.push_back({wire.from.name(), wire.to.name(),
                         wire.color.empty() ? std::string("(not given)") : wire.color,
                         netcheck::joined(notes, "; ")});
    }
    return lines;
}

std::vector<LinkLine> linkList(const Board& board) {
    std::vector<LinkLine> lines;
    for (const auto& link : board.links) {
        double dr = link.to.row - link.from.row;
        double dc = link.to.col - link.from.col;
        lines.push_back({netcheck::holeName(link.from), netcheck::holeName(link.to),
                         std::hypot(dr, dc) * board.pitchMm, link.copperSide, link.insulated});
    }
    return lines;
}

std::vector<AssemblyStep> assemblyOrder(const Board& board) {
    std::vector<AssemblyStep> steps;
    steps.push_back({"Check the board: " + boardSizeText(board) +
                         "; trim it to size and file the edges before cutting.",
                     {}});
    if (!board.cuts.empty()) {
        steps.push_back({"Make the " + countText(board.cuts.size(), "track cut", "track cuts") +
                             " from the copper side: lay the board copper up on the mirrored "
                             "print (hole 1 at the right) and check every cut with a magnifier.",
                         {}});
    }
    std::size_t components = 0, bridges = 0, sleeved = 0;
    for (const auto& link : board.links) {
        (link.copperSide ? bridges : components) += 1;
        if (link.insulated && !link.copperSide) ++sleeved;
    }
    if (components > 0) {
        const std::string which = sleeved == 1 ? "the one" : "the " + std::to_string(sleeved);
        const std::string sleeves = sleeved == 0 ? "" : " Sleeve " + which + " marked sleeved in the link list.";
        steps.push_back({"Fit the " + countText(components, "wire link", "wire links") +
                             " on the component side." + sleeves,
                         {}});
    }
    static const char* kRankText[] = {"Fit the lowest parts (lying flat)",
                                      "Fit ICs or their sockets, and small capacitors",
                                      "Fit transistors, LEDs, regulators and other medium parts",
                                      "Fit the tallest parts last on the board"};
    for (int rank = 0; rank < 4; ++rank) {
        AssemblyStep step{kRankText[rank], {}};
        for (const auto& part : board.parts) {
            if (heightRank(part.kind) == rank) step.refs.push_back(part.ref);
        }
        std::sort(step.refs.begin(), step.refs.end(), refLess);
        if (!step.refs.empty()) steps.push_back(step);
    }
    if (bridges > 0) {
        steps.push_back({"Make the " + countText(bridges, "copper-side link", "copper-side links") +
                             " (solder bridges or wires on the copper side).",
                         {}});
    }
    if (!board.wires.empty()) {
        steps.push_back(
            {"Off-board wiring last: " + countText(board.wires.size(), "wire", "wires") +
                 ", colours as in the wiring list.",
             {}});
    }
    steps.push_back(
        {"Inspect the copper side for solder bridges between strips, compare with "
         "the check result, then power up from a current-limited low-voltage supply.",
         {}});
    return steps;
}

std::string boardSizeText(const Board& board) {
    return netcheck::boardSize(board, 2);
}

}  // namespace sheet

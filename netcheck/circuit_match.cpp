// Matching parts by reference designator. Lookups go through hash maps built once per check, so
// the cost grows with the number of pins, not with pins times parts.
#include "circuit_match.hpp"

#include <algorithm>
#include <unordered_map>

#include "part_kinds.hpp"
#include "part_orientation.hpp"
#include "value.hpp"

namespace netcheck {

namespace {

struct BoardSlot {
    bool offboard = false;
    int index = -1;
};

std::unordered_map<std::string_view, BoardSlot> indexBoardParts(const Board& board) {
    std::unordered_map<std::string_view, BoardSlot> slots;
    slots.reserve(board.parts.size() + board.offboard.size());
    for (std::size_t p = 0; p < board.parts.size(); ++p) {
        slots.emplace(board.parts[p].ref, BoardSlot{false, static_cast<int>(p)});
    }
    for (std::size_t p = 0; p < board.offboard.size(); ++p) {
        slots.emplace(board.offboard[p].ref, BoardSlot{true, static_cast<int>(p)});
    }
    return slots;
}

void placeOnBoard(const CheckContext& context, PartUse& use, BoardSlot slot) {
    use.offboard = slot.offboard;
    use.index = slot.index;
    const Board& board = context.board();
    const auto at = static_cast<std::size_t>(slot.index);
    if (slot.offboard) {
        const auto lugs = static_cast<int>(board.offboard[at].pins.size());
        for (int k = 0; k < lugs; ++k) use.nodes.push_back(context.lugNode(slot.index, k));
    } else {
        for (const Pin& pin : board.parts[at].pins) use.nodes.push_back(context.holeIndex(pin.hole));
    }
    use.net.assign(use.nodes.size(), -1);
    use.nameOf.resize(use.nodes.size());
    for (std::size_t k = 0; k < use.nameOf.size(); ++k) use.nameOf[k] = static_cast<int>(k);
}

// Every ref the circuit mentions (declared parts, then refs only named in nets), placed on the
// board where it exists.
class Uses {
public:
    Uses(const CheckContext& context, const Circuit& circuit)
        : context_(context), slots_(indexBoardParts(context.board())) {
        uses_.reserve(circuit.parts.size());
        byRef_.reserve(circuit.parts.size());
        for (const auto& [ref, part] : circuit.parts) add(ref, &part);
    }

    PartUse& get(std::string_view ref) {
        auto it = byRef_.find(ref);
        return it != byRef_.end() ? uses_[static_cast<std::size_t>(it->second)] : add(ref, nullptr);
    }

    std::vector<PartUse>& all() { return uses_; }
    bool mentions(std::string_view ref) const { return byRef_.count(ref) > 0; }

private:
    PartUse& add(std::string_view ref, const CircuitPart* part) {
        byRef_.emplace(ref, static_cast<int>(uses_.size()));
        PartUse& use = uses_.emplace_back();
        use.ref = ref;
        use.circuitPart = part;
        auto slot = slots_.find(ref);
        if (slot != slots_.end()) placeOnBoard(context_, use, slot->second);
        return use;
    }

    const CheckContext& context_;
    std::unordered_map<std::string_view, BoardSlot> slots_;
    std::unordered_map<std::string_view, int> byRef_;
    std::vector<PartUse> uses_;
};

std::string joinNames(const std::vector<std::string>& names) {
    std::string text;
    for (const std::string& name : names) text += (text.empty() ? "" : ", ") + name;
    return text;
}

std::vector<std::string> boardPinNames(const Board& board, const PartUse& use) {
    std::vector<std::string> names;
    for (int k = 0; k < use.pinCount(); ++k) names.push_back(use.pinName(board, k));
    return names;
}

std::string placeText(const CheckContext& context, const PartUse& use) {
    std::vector<std::string> places;
    for (int node : use.nodes) places.push_back(context.nodeName(node));
    return places.empty() ? "" : " (at " + joinNames(places) + ")";
}

Finding refFinding(std::string type, Severity severity, std::string_view ref, std::string message) {
    Finding finding;
    finding.type = std::move(type);
    finding.severity = severity;
    finding.ref = std::string(ref);
    finding.message = std::move(message);
    return finding;
}

std::string describeCircuitPart(const PartUse& use) {
    if (use.circuitPart == nullptr || use.circuitPart->kind.empty()) return "";
    const std::string& value = use.circuitPart->value;
    return " (" + use.circuitPart->kind + (value.empty() ? "" : " " + value) + ")";
}

void checkPins(const CheckContext& context, const PartUse& use, std::vector<Finding>& errors) {
    const Board& board = context.board();
    const std::vector<std::string> onBoard = boardPinNames(board, use);
    std::string problem;
    if (!use.unknownPins.empty()) {
        problem = "the circuit uses pin" + std::string(use.unknownPins.size() > 1 ? "s " : " ") +
                  joinNames(use.unknownPins) + ", but the board part has " + joinNames(onBoard);
    } else if (use.circuitPart != nullptr && !use.circuitPart->pins.empty()) {
        std::vector<std::string> declared = use.circuitPart->pins;
        std::vector<std::string> present = onBoard;
        std::sort(declared.begin(), declared.end());
        std::sort(present.begin(), present.end());
        if (declared != present) {
            problem = "the circuit declares pins " + joinNames(use.circuitPart->pins) +
                      ", but the board part has " + joinNames(onBoard);
        }
    }
    if (problem.empty()) return;
    Finding finding = refFinding("pin-mismatch", Severity::Error, use.ref,
                                 std::string(use.ref) + ": " + problem + placeText(context, use));
    for (int node : use.nodes) {
        if (context.isHoleNode(node)) finding.holes.push_back(context.holeAt(node));
    }
    errors.push_back(std::move(finding));
}

void checkValue(const CheckContext& context, const PartUse& use, std::vector<Finding>& errors,
                std::vector<Finding>& warnings) {
    if (use.circuitPart == nullptr || use.circuitPart->value.empty()) return;
    const Board& board = context.board();
    const std::string& onBoard = use.value(board);
    const std::string& intended = use.circuitPart->value;
    if (sameValue(onBoard, intended)) return;
    const PartKind* kind = findPartKind(use.kind(board));
    if (kind == nullptr) kind = findPartKind(use.circuitPart->kind);
    const bool quantity = kind != nullptr && kind->quantity;
    const std::string shown = onBoard.empty() ? "no value" : "\"" + onBoard + "\"";
    Finding finding = refFinding(
        quantity ? "value-mismatch" : "value-differs", quantity ? Severity::Error : Severity::Warning,
        use.ref,
        std::string(use.ref) + " is " + shown + " on the board but \"" + intended +
            "\" in the circuit" + placeText(context, use));
    for (int node : use.nodes) {
        if (context.isHoleNode(node)) finding.holes.push_back(context.holeAt(node));
    }
    (quantity ? errors : warnings).push_back(std::move(finding));
}

void reportExtraParts(const CheckContext& context, const Uses& uses, std::vector<Finding>& errors) {
    const Board& board = context.board();
    std::vector<Finding> extra;
    for (const Part& part : board.parts) {
        if (uses.mentions(part.ref)) continue;
        Finding finding = refFinding("extra-part", Severity::Error, part.ref, "");
        std::vector<std::string> holes;
        for (const Pin& pin : part.pins) {
            holes.push_back(holeName(pin.hole));
            finding.holes.push_back(pin.hole);
        }
        finding.message = part.ref + " (" + part.kind + ") is on the board (at " +
                          joinNames(holes) + ") but not in the circuit";
        extra.push_back(std::move(finding));
    }
    for (const OffboardPart& part : board.offboard) {
        if (uses.mentions(part.ref)) continue;
        extra.push_back(refFinding("extra-part", Severity::Error, part.ref,
                                   part.ref + " (" + part.kind +
                                       ", off the board) is wired up but not in the circuit"));
    }
    std::stable_sort(extra.begin(), extra.end(),
                     [](const Finding& a, const Finding& b) { return a.ref < b.ref; });
    errors.insert(errors.end(), extra.begin(), extra.end());
}

// Puts every net pin on its board pin; unknown pins are noted for pin-mismatch.
std::vector<std::string> assignNets(const CheckContext& context, const Circuit& circuit,
                                    Uses& uses) {
    std::vector<std::string> names;
    names.reserve(circuit.nets.size());
    for (const auto& [name, pins] : circuit.nets) {
        const int net = static_cast<int>(names.size());
        names.push_back(name);
        for (const PinRef& pin : pins) {
            PartUse& use = uses.get(pin.ref);
            if (!use.found()) continue;
            const int k = use.findPin(context.board(), pin.pin);
            if (k < 0) {
                use.unknownPins.push_back(pin.pin);
            } else if (use.net[static_cast<std::size_t>(k)] < 0) {
                use.net[static_cast<std::size_t>(k)] = net;
            }
        }
    }
    return names;
}

std::vector<PlacedNet> placeNets(const Board& board, const std::vector<PartUse>& uses,
                                 const std::vector<std::string>& names) {
    std::vector<PlacedNet> nets(names.size());
    for (std::size_t n = 0; n < names.size(); ++n) nets[n].name = names[n];
    for (const PartUse& use : uses) {
        if (!use.found() || !use.unknownPins.empty()) continue;
        for (int k = 0; k < use.pinCount(); ++k) {
            const auto at = static_cast<std::size_t>(k);
            if (use.net[at] < 0) continue;
            nets[static_cast<std::size_t>(use.net[at])].pins.push_back(
                NetPin{PinRef{std::string(use.ref), use.pinName(board, use.nameOf[at])},
                       use.nodes[at]});
        }
    }
    return nets;
}

}  // namespace

CircuitMatch matchCircuit(const CheckContext& context, const Circuit& circuit) {
    CircuitMatch match;
    Uses uses(context, circuit);
    const std::vector<std::string> names = assignNets(context, circuit, uses);
    std::vector<PartUse>& all = uses.all();
    // Declared parts come sorted from the circuit; only refs named just in nets need sorting.
    auto byRef = [](const PartUse& a, const PartUse& b) { return a.ref < b.ref; };
    if (!std::is_sorted(all.begin(), all.end(), byRef)) {
        std::stable_sort(all.begin(), all.end(), byRef);
    }
    for (const PartUse& use : all) {
        if (use.found()) continue;
        match.errors.push_back(refFinding("missing-part", Severity::Error, use.ref,
                                          std::string(use.ref) + describeCircuitPart(use) +
                                              " is in the circuit but not on the board"));
    }
    reportExtraParts(context, uses, match.errors);
    for (PartUse& use : all) {
        if (!use.found()) continue;
        std::sort(use.unknownPins.begin(), use.unknownPins.end());
        use.unknownPins.erase(std::unique(use.unknownPins.begin(), use.unknownPins.end()),
                              use.unknownPins.end());
        checkPins(context, use, match.errors);
    }
    for (const PartUse& use : all) {
        if (use.found()) checkValue(context, use, match.errors, match.warnings);
    }
    orientParts(context, all, names, match.errors, match.warnings);
    match.nets = placeNets(context.board(), all, names);
    return match;
}

}  // namespace netcheck

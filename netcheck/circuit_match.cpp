// Matching parts by reference designator. Lookups go through one hash table built once per check,
// so the cost grows with the number of pins, not with pins times parts; the per-pin arrays of
// every part live in one pool.
#include "circuit_match.hpp"

#include <algorithm>
#include <cstdint>
#include <span>

#include "part_kinds.hpp"
#include "part_orientation.hpp"
#include "value.hpp"

namespace netcheck {

namespace {

struct BoardSlot {
    bool offboard = false;
    int index = -1;
};

// What one reference designator names: its board part (if any) and its use (if the circuit
// mentions it).
struct RefEntry {
    BoardSlot slot;
    int use = -1;
};

// Refs to entries in one flat open-addressed table (linear probing, at most half full), so a
// check allocates no node per part and hashes each ref once per lookup.
class RefTable {
public:
    explicit RefTable(std::size_t expected) { rehash(2 * expected); }

    /// The entry of `ref`, inserted empty if absent. `ref` must outlive the table.
    RefEntry& at(std::string_view ref) {
        if (2 * (used_ + 1) > slots_.size()) rehash(slots_.size() * 2);
        Slot& slot = slots_[indexOf(ref)];
        if (!slot.used) {
            slot = Slot{ref, true, RefEntry{}};
            ++used_;
        }
        return slot.entry;
    }

    /// The entry of `ref`, or null.
    const RefEntry* find(std::string_view ref) const {
        const Slot& slot = slots_[indexOf(ref)];
        return slot.used ? &slot.entry : nullptr;
    }

private:
    struct Slot {
        std::string_view key;
        bool used = false;
        RefEntry entry;
    };

    static std::size_t hash(std::string_view text) {
        std::uint64_t h = 14695981039346656037ull;  // FNV-1a: refs are a few characters long
        for (char c : text) h = (h ^ static_cast<unsigned char>(c)) * 1099511628211ull;
        return static_cast<std::size_t>(h ^ (h >> 29));
    }

    // The slot holding `ref`, or the empty slot where it would go.
    std::size_t indexOf(std::string_view ref) const {
        const std::size_t mask = slots_.size() - 1;
        for (std::size_t i = hash(ref) & mask;; i = (i + 1) & mask) {
            if (!slots_[i].used || slots_[i].key == ref) return i;
        }
    }

    void rehash(std::size_t wanted) {
        std::size_t size = 16;
        while (size < wanted) size *= 2;
        std::vector<Slot> old = std::move(slots_);
        slots_.assign(size, Slot{});
        for (const Slot& slot : old) {
            if (slot.used) slots_[indexOf(slot.key)] = slot;
        }
    }

    std::vector<Slot> slots_;
    std::size_t used_ = 0;
};

std::size_t boardPinCount(const Board& board) {
    std::size_t count = 0;
    for (const Part& part : board.parts) count += part.pins.size();
    for (const OffboardPart& part : board.offboard) count += part.pins.size();
    return count;
}

// Every ref the circuit mentions (declared parts, then refs only named in nets), placed on the
// board where it exists.
class Uses {
public:
    Uses(const CheckContext& context, const Circuit& circuit)
        : context_(context),
          refs_(context.board().parts.size() + context.board().offboard.size() +
                circuit.parts.size()) {
        const Board& board = context.board();
        // The first board part of a ref wins, on-board parts before off-board ones.
        for (std::size_t p = 0; p < board.parts.size(); ++p) {
            RefEntry& entry = refs_.at(board.parts[p].ref);
            if (entry.slot.index < 0) entry.slot = BoardSlot{false, static_cast<int>(p)};
        }
        for (std::size_t p = 0; p < board.offboard.size(); ++p) {
            RefEntry& entry = refs_.at(board.offboard[p].ref);
            if (entry.slot.index < 0) entry.slot = BoardSlot{true, static_cast<int>(p)};
        }
        // Each board part is placed at most once, so the pool never grows past this and the
        // spans into it stay valid.
        pool_.reserve(3 * boardPinCount(board));
        uses_.reserve(circuit.parts.size());
        for (const auto& [ref, part] : circuit.parts) get(ref).circuitPart = &part;
    }

    PartUse& get(std::string_view ref) {
        RefEntry& entry = refs_.at(ref);
        if (entry.use < 0) {
            entry.use = static_cast<int>(uses_.size());
            PartUse& use = uses_.emplace_back();
            use.ref = ref;
            if (entry.slot.index >= 0) place(use, entry.slot);
        }
        return uses_[static_cast<std::size_t>(entry.use)];
    }

    std::vector<PartUse>& all() { return uses_; }
    bool mentions(std::string_view ref) const {
        const RefEntry* entry = refs_.find(ref);
        return entry != nullptr && entry->use >= 0;
    }

private:
    std::span<int> take(std::size_t count) {
        const std::size_t at = pool_.size();
        pool_.resize(at + count);
        return std::span<int>(pool_.data() + at, count);
    }

    void place(PartUse& use, BoardSlot slot) {
        use.offboard = slot.offboard;
        use.index = slot.index;
        const Board& board = context_.board();
        const auto at = static_cast<std::size_t>(slot.index);
        const std::size_t pins =
            slot.offboard ? board.offboard[at].pins.size() : board.parts[at].pins.size();
        use.nodes = take(pins);
        use.net = take(pins);
        use.nameOf = take(pins);
        for (std::size_t k = 0; k < pins; ++k) {
            use.nodes[k] = slot.offboard ? context_.lugNode(slot.index, static_cast<int>(k))
                                         : context_.holeIndex(board.parts[at].pins[k].hole);
            use.net[k] = -1;
            use.nameOf[k] = static_cast<int>(k);
        }
    }

    const CheckContext& context_;
    RefTable refs_;
    std::vector<int> pool_;
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
    const bool declaresPins = use.circuitPart != nullptr && !use.circuitPart->pins.empty();
    if (use.unknownPins.empty() && !declaresPins) return;  // nothing to compare
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
    if (onBoard == intended || sameValue(onBoard, intended)) return;
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
                                 std::vector<std::string> names) {
    std::vector<PlacedNet> nets(names.size());
    std::vector<std::size_t> sizes(names.size(), 0);
    for (const PartUse& use : uses) {
        if (!use.found() || !use.unknownPins.empty()) continue;
        for (int net : use.net) {
            if (net >= 0) ++sizes[static_cast<std::size_t>(net)];
        }
    }
    for (std::size_t n = 0; n < names.size(); ++n) {
        nets[n].name = std::move(names[n]);
        nets[n].pins.reserve(sizes[n]);
    }
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
    std::vector<std::string> names = assignNets(context, circuit, uses);
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
    match.nets = placeNets(context.board(), all, std::move(names));
    return match;
}

}  // namespace netcheck

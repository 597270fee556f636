// Matching parts by reference designator. Lookups go through one hash table built once per check,
// so the cost grows with the number of pins, not with pins times parts; the per-pin arrays of
// every part live in one pool.
#include "netcheck/check/detail/circuit_match.hpp"

#include <algorithm>
#include <array>
#include <cstdint>
#include <numeric>
#include <span>

#include "netcheck/model/part_kinds.hpp"
#include "netcheck/check/detail/part_orientation.hpp"
#include "netcheck/model/value.hpp"

namespace netcheck {

namespace {

// Asks for `lines` cache lines from `at` on to be brought in ahead of use.
void prefetchLines(const void* at, int lines) {
    const auto* line = static_cast<const char*>(at);
    for (int i = 0; i < lines; ++i) __builtin_prefetch(line + 64 * i);
}

// Every board part gets a use as the check starts, read in the board's order (one pass through
// memory); a ref the circuit names that the board lacks gets one when first named. The first
// board part of a ref wins, on-board parts before off-board ones.
class Uses {
public:
    Uses(const CheckContext& context, const Circuit& circuit, MatchMemory& memory)
        : context_(context), memory_(memory) {
        const Board& board = context.board();
        memory_.refs.reset(board.parts.size() + board.offboard.size());
        for (auto* list :
             {&memory_.pool, &memory_.useOfPart, &memory_.useOfOffboard, &memory_.order})
            list->clear();
        memory_.uses.clear();
        memory_.unknownPins.clear();
        memory_.mentionedPart.clear();
        memory_.mentionedOffboard.clear();
        // Circuit refs mostly name board parts: room for a few missing ones, growing past that.
        // (Kept under 1 KB on a small board, where a larger block would make malloc tidy up its
        // free lists on every check.)
        const std::size_t boardParts = board.parts.size() + board.offboard.size();
        memory_.uses.reserve(boardParts + boardParts / 8 + 1);
        memory_.order.reserve(circuit.parts.size());
        // Each board part is placed once, so the pool never grows past this and the pin arrays
        // in it stay put.
        std::size_t lugs = 0;
        for (const OffboardPart& part : board.offboard) lugs += part.pins.size();
        memory_.pool.reserve(PartUse::kArraysPerPin * (context.partPinCount() + lugs));
        memory_.useOfPart.reserve(board.parts.size());
        for (std::size_t p = 0; p < board.parts.size(); ++p) {
            if (p + kLookAhead < board.parts.size()) prefetchPart(board.parts[p + kLookAhead]);
            memory_.useOfPart.push_back(addBoardPart(board.parts[p].ref, false, p));
        }
        memory_.useOfOffboard.reserve(board.offboard.size());
        for (std::size_t p = 0; p < board.offboard.size(); ++p) {
            memory_.useOfOffboard.push_back(addBoardPart(board.offboard[p].ref, true, p));
        }
    }

    /// Call once the circuit's declared parts are mentioned, before any ref only named in nets.
    void endOfDeclaredParts() { declared_ = memory_.order.size(); }

    /// Index of the use of a ref the circuit names (`key` is RefTable::keyOf(ref)); a ref the
    /// board lacks gets a use here. Reads the table, not the use, so a batch can ask for its uses
    /// before it reads any.
    int find(const std::string& ref, const RefTable::Key& key) {
        const int u = memory_.refs.insert(ref, key, static_cast<int>(memory_.uses.size()));
        if (u == static_cast<int>(memory_.uses.size())) memory_.uses.emplace_back().refName = &ref;
        return u;
    }

    /// Notes that the circuit names use `u` (kept in the order of first mention).
    void mention(int u) {
        PartUse& use = at(u);
        if (!use.mentioned) {
            use.mentioned = true;
            memory_.order.push_back(u);
        }
    }

    PartUse& at(int u) { return memory_.uses[static_cast<std::size_t>(u)]; }
    const RefTable& refs() const { return memory_.refs; }

    /// Every use the circuit mentions, by ref, moved in place to the front of the uses (the rest
    /// follow): every later pass goes through the parts by ref, and on a large board would
    /// otherwise jump around in memory. Call once, after every ref has been mentioned; afterwards
    /// use indices (mention(), at()) no longer hold.
    std::span<PartUse> mentionedByRef() {
        // Declared parts come sorted from the circuit; only refs named just in nets need sorting.
        if (memory_.order.size() > declared_) {
            std::stable_sort(memory_.order.begin(), memory_.order.end(),
                             [&](int a, int b) { return at(a).ref() < at(b).ref(); });
        }
        for (int u : memory_.useOfPart) memory_.mentionedPart.push_back(at(u).mentioned ? 1 : 0);
        for (int u : memory_.useOfOffboard)
            memory_.mentionedOffboard.push_back(at(u).mentioned ? 1 : 0);
        // Boards numbered in placement order are often in ref order already.
        bool inPlace = true;
        for (std::size_t i = 0; i < memory_.order.size() && inPlace; ++i) {
            inPlace = memory_.order[i] == static_cast<int>(i);
        }
        if (inPlace) return std::span<PartUse>(memory_.uses.data(), memory_.order.size());
        // Swaps each use into its place; `slot` and `use` track which use sits where.
        std::vector<int>& slot = memory_.slotOfUse;
        std::vector<int>& use = memory_.useInSlot;
        slot.resize(memory_.uses.size());
        use.resize(memory_.uses.size());
        std::iota(slot.begin(), slot.end(), 0);
        std::iota(use.begin(), use.end(), 0);
        auto slotOf = [&](int u) {
            return static_cast<std::size_t>(slot[static_cast<std::size_t>(u)]);
        };
        for (std::size_t i = 0; i < memory_.order.size(); ++i) {
            if (i + kLookAhead < memory_.order.size())
                __builtin_prefetch(&memory_.uses[slotOf(memory_.order[i + kLookAhead])]);
            const std::size_t from = slotOf(memory_.order[i]);
            if (from == i) continue;
            std::swap(memory_.uses[i], memory_.uses[from]);
            std::swap(use[i], use[from]);
            slot[static_cast<std::size_t>(use[i])] = static_cast<int>(i);
            slot[static_cast<std::size_t>(use[from])] = static_cast<int>(from);
        }
        return std::span<PartUse>(memory_.uses.data(), memory_.order.size());
    }

    /// Notes a pin the circuit uses that the part lacks (for pin-mismatch).
    void noteUnknownPin(PartUse& use, std::string_view pin) {
        use.hasUnknownPins = true;
        memory_.unknownPins.emplace_back(use.ref(), pin);
    }

    /// The pins the circuit uses that the board part of `ref` lacks, sorted, each once.
    std::vector<std::string> unknownPinsOf(std::string_view ref) {
        if (!unknownSorted_) {
            std::sort(memory_.unknownPins.begin(), memory_.unknownPins.end());
            memory_.unknownPins.erase(
                std::unique(memory_.unknownPins.begin(), memory_.unknownPins.end()),
                memory_.unknownPins.end());
            unknownSorted_ = true;
        }
        std::vector<std::string> pins;
        auto it = std::lower_bound(memory_.unknownPins.begin(), memory_.unknownPins.end(),
                                   std::pair<std::string_view, std::string_view>{ref, {}});
        for (; it != memory_.unknownPins.end() && it->first == ref; ++it)
            pins.emplace_back(it->second);
        return pins;
    }

    /// Whether the circuit names board part `p` (of board.parts, or of board.offboard); asked
    /// after mentionedByRef().
    bool mentionsPart(std::size_t p) const { return memory_.mentionedPart[p] != 0; }
    bool mentionsOffboard(std::size_t p) const { return memory_.mentionedOffboard[p] != 0; }

private:
    // On a large board the table slots of consecutive parts are far apart in memory; asking for
    // them a few parts ahead lets the waits overlap.
    static constexpr std::size_t kLookAhead = 32;

    void prefetchPart(const Part& part) const { memory_.refs.prefetch(RefTable::keyOf(part.ref)); }

    int addBoardPart(const std::string& ref, bool offboard, std::size_t p) {
        const int u = memory_.refs.insert(ref, static_cast<int>(memory_.uses.size()));
        if (u == static_cast<int>(memory_.uses.size())) {
            PartUse& use = memory_.uses.emplace_back();
            use.refName = &ref;
            place(use, offboard, p);
        }
        return u;
    }

    void place(PartUse& use, bool offboard, std::size_t at) {
        use.offboard = offboard;
        use.index = static_cast<int>(at);
        const Board& board = context_.board();
        std::size_t pins = 0;
        if (offboard) {
            const OffboardPart& part = board.offboard[at];
            use.board.lugs = part.pins.data();
            use.board.valueKey = ValueKey::of(part.value);
            use.board.known = findPartKind(part.kind);
            pins = part.pins.size();
        } else {
            const Part& part = board.parts[at];
            use.board.pins = part.pins.data();
            use.board.valueKey = ValueKey::of(part.value);
            use.board.known = findPartKind(part.kind);
            pins = part.pins.size();
        }
        use.pins = static_cast<int>(pins);
        use.pool = memory_.pool.data() + memory_.pool.size();
        memory_.pool.resize(memory_.pool.size() + PartUse::kArraysPerPin * pins);
        const std::span<const Lead> leads =
            offboard ? std::span<const Lead>{} : context_.leadsOfPart(use.index);
        for (std::size_t k = 0; k < pins; ++k) {
            use.net()[k] = -1;
            use.nameOf()[k] = static_cast<int>(k);
            if (!leads.empty()) {  // what the leads know, without reading the part's pins
                use.nodes()[k] = leads[k].hole;
                use.islands()[k] = leads[k].island;
                use.pinKeys()[k] = static_cast<int>(leads[k].nameKey);
                continue;
            }
            const Connectivity& copper = context_.copper();
            if (offboard) {
                use.nodes()[k] = context_.lugNode(use.index, static_cast<int>(k));
                use.islands()[k] = copper.islandOfNode(use.nodes()[k]);
            } else {  // a pin off the board: it joins nothing
                use.nodes()[k] = context_.holeIndex(use.board.pins[k].hole);
                use.islands()[k] = copper.islandOfHole(use.board.pins[k].hole);
            }
            use.pinKeys()[k] = static_cast<int>(PinKey::of(use.pinName(static_cast<int>(k))));
        }
    }

    const CheckContext& context_;
    MatchMemory& memory_;  // the lists live there, so a re-check reuses them
    bool unknownSorted_ = false;
    std::size_t declared_ = 0;
};

std::string joinNames(const std::vector<std::string>& names) {
    std::string text;
    for (const std::string& name : names) text += (text.empty() ? "" : ", ") + name;
    return text;
}

std::vector<std::string> boardPinNames(const PartUse& use) {
    std::vector<std::string> names;
    for (int k = 0; k < use.pinCount(); ++k) names.push_back(use.pinName(k));
    return names;
}

std::string placeText(const CheckContext& context, const PartUse& use) {
    std::vector<std::string> places;
    for (int node : use.nodes()) places.push_back(context.nodeName(node));
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

void checkPins(const CheckContext& context, const PartUse& use,
               const std::vector<std::string>& unknownPins, std::vector<Finding>& errors) {
    if (unknownPins.empty() && !use.declaresPins) return;  // nothing to compare
    const std::vector<std::string> onBoard = boardPinNames(use);
    std::string problem;
    if (!unknownPins.empty()) {
        problem = "the circuit uses pin" + std::string(unknownPins.size() > 1 ? "s " : " ") +
                  joinNames(unknownPins) + ", but the board part has " + joinNames(onBoard);
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
    Finding finding = refFinding("pin-mismatch", Severity::Error, use.ref(),
                                 std::string(use.ref()) + ": " + problem + placeText(context, use));
    for (int node : use.nodes()) {
        if (context.isHoleNode(node)) finding.holes.push_back(context.holeAt(node));
    }
    errors.push_back(std::move(finding));
}

void checkValue(const CheckContext& context, const PartUse& use, std::vector<Finding>& errors,
                std::vector<Finding>& warnings) {
    if (!use.valueDiffers) return;
    const std::string& onBoard = use.value(context.board());
    const std::string& intended = use.circuitPart->value;
    const PartKind* kind = use.board.known;
    if (kind == nullptr) kind = findPartKind(use.circuitPart->kind);
    const bool quantity = kind != nullptr && kind->quantity;
    const std::string shown = onBoard.empty() ? "no value" : "\"" + onBoard + "\"";
    Finding finding = refFinding(quantity ? "value-mismatch" : "value-differs",
                                 quantity ? Severity::Error : Severity::Warning, use.ref(),
                                 std::string(use.ref()) + " is " + shown + " on the board but \"" +
                                     intended + "\" in the circuit" + placeText(context, use));
    for (int node : use.nodes()) {
        if (context.isHoleNode(node)) finding.holes.push_back(context.holeAt(node));
    }
    (quantity ? errors : warnings).push_back(std::move(finding));
}

void reportExtraParts(const CheckContext& context, const Uses& uses, std::vector<Finding>& errors) {
    const Board& board = context.board();
    std::vector<Finding> extra;
    for (std::size_t p = 0; p < board.parts.size(); ++p) {
        if (uses.mentionsPart(p)) continue;
        const Part& part = board.parts[p];
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
    for (std::size_t p = 0; p < board.offboard.size(); ++p) {
        if (uses.mentionsOffboard(p)) continue;
        const OffboardPart& part = board.offboard[p];
        extra.push_back(refFinding(
            "extra-part", Severity::Error, part.ref,
            part.ref + " (" + part.kind + ", off the board) is wired up but not in the circuit"));
    }
    std::stable_sort(extra.begin(), extra.end(),
                     [](const Finding& a, const Finding& b) { return a.ref < b.ref; });
    errors.insert(errors.end(), extra.begin(), extra.end());
}

// Refs are looked up in batches, in order: first the table slots of a whole batch are asked for,
// then its uses, then their pin arrays, so on a large board the batch waits for memory three
// times rather than three times per ref. `Finish(PartUse&, const Item&)` runs in the refs' order.
template <typename Item, typename Finish>
class MentionBatch {
public:
    MentionBatch(Uses& uses, Finish finish) : uses_(uses), finish_(std::move(finish)) {}

    void add(const std::string& ref, const Item& item) {
        const RefTable::Key key = RefTable::keyOf(ref);
        uses_.refs().prefetch(key);
        pending_[size_++] = Pending{&ref, key, item, -1};
        if (size_ == pending_.size()) flush();
    }

    void flush() {
        for (std::size_t i = 0; i < size_; ++i) {
            Pending& p = pending_[i];
            p.use = uses_.find(*p.ref, p.key);
            __builtin_prefetch(&uses_.at(p.use));
        }
        for (std::size_t i = 0; i < size_; ++i) {
            uses_.mention(pending_[i].use);
            __builtin_prefetch(uses_.at(pending_[i].use).pool);
        }
        for (std::size_t i = 0; i < size_; ++i)
            finish_(uses_.at(pending_[i].use), pending_[i].item);
        size_ = 0;
    }

private:
    struct Pending {
        const std::string* ref;
        RefTable::Key key;
        Item item;
        int use;
    };

    Uses& uses_;
    Finish finish_;
    std::array<Pending, 16> pending_;  // entries below size_ are written before read
    std::size_t size_ = 0;
};

// Declared parts: their circuit entries, and whether their values differ from the board's.
void declareParts(const Board& board, const Circuit& circuit, Uses& uses) {
    auto declare = [&board](PartUse& use, const CircuitPart* part) {
        use.circuitPart = part;
        use.declaresPins = !part->pins.empty();
        use.valueDiffers = use.found() && !part->value.empty() &&
                           !use.valueIs(board, part->value) &&
                           !sameValue(use.value(board), part->value);
    };
    MentionBatch<const CircuitPart*, decltype(declare)> batch(uses, declare);
    for (const auto& [ref, part] : circuit.parts) batch.add(ref, &part);
    batch.flush();
    uses.endOfDeclaredParts();
}

// Puts every net pin on its board pin; unknown pins are noted for pin-mismatch.
void assignNets(const Circuit& circuit, Uses& uses, std::vector<std::string_view>& names) {
    names.clear();
    names.reserve(circuit.nets.size());
    struct PinOfNet {
        const std::string* pin;
        int net;
        std::uint32_t key;  // PinKey of the name, read with the net rather than with the part
    };
    auto assign = [&uses](PartUse& use, const PinOfNet& at) {
        if (!use.found()) return;
        const int k = use.findPin(at.key, *at.pin);
        if (k < 0) {
            uses.noteUnknownPin(use, *at.pin);
        } else if (use.net()[static_cast<std::size_t>(k)] < 0) {
            use.net()[static_cast<std::size_t>(k)] = at.net;
        }
    };
    MentionBatch<PinOfNet, decltype(assign)> batch(uses, assign);
    // Each net's pins lie in a block of their own: ask for the block a few nets ahead.
    auto ahead = circuit.nets.begin();
    for (int i = 0; i < 8 && ahead != circuit.nets.end(); ++i) ++ahead;
    for (const auto& [name, pins] : circuit.nets) {
        if (ahead != circuit.nets.end()) prefetchLines((ahead++)->second.data(), 2);
        const int net = static_cast<int>(names.size());
        names.push_back(name);
        for (const PinRef& pin : pins)
            batch.add(pin.ref, PinOfNet{&pin.pin, net, PinKey::of(pin.pin)});
    }
    batch.flush();
}

// The pins of every net, net after net in one array (a counting sort by net), each net's pins in
// the order of the parts' refs.
void placeNets(std::span<const PartUse> uses, const std::vector<std::string_view>& names,
               std::vector<std::size_t>& start, CircuitMatch& match) {
    start.assign(names.size() + 1, 0);
    for (const PartUse& use : uses) {
        if (!use.found() || use.hasUnknownPins) continue;
        for (int net : use.net()) {
            if (net >= 0) ++start[static_cast<std::size_t>(net) + 1];
        }
    }
    for (std::size_t n = 0; n < names.size(); ++n) start[n + 1] += start[n];
    match.netPins.resize(start.back());
    // Filling net n moves start[n] on to where net n + 1 begins; shifting back restores it.
    std::vector<std::size_t>& next = start;
    for (const PartUse& use : uses) {
        if (!use.found() || use.hasUnknownPins) continue;
        for (int k = 0; k < use.pinCount(); ++k) {
            const auto at = static_cast<std::size_t>(k);
            const int net = use.net()[at];
            if (net < 0) continue;
            match.netPins[next[static_cast<std::size_t>(net)]++] = NetPin{
                use.refName, &use.pinName(use.nameOf()[at]), use.nodes()[at], use.islands()[at]};
        }
    }
    std::copy_backward(start.begin(), start.end() - 1, start.end());
    start[0] = 0;
    match.nets.resize(names.size());
    for (std::size_t n = 0; n < names.size(); ++n) {
        match.nets[n].name = names[n];
        match.nets[n].pins =
            std::span<const NetPin>(match.netPins.data() + start[n], start[n + 1] - start[n]);
    }
}

}  // namespace

void matchCircuit(const CheckContext& context, const Circuit& circuit, MatchMemory& memory,
                  CircuitMatch& match) {
    match.errors.clear();
    match.warnings.clear();
    Uses uses(context, circuit, memory);
    declareParts(context.board(), circuit, uses);
    const std::vector<std::string_view>& names = memory.netNames;
    assignNets(circuit, uses, memory.netNames);
    const std::span<PartUse> all = uses.mentionedByRef();
    for (const PartUse& use : all) {
        if (use.found()) continue;
        match.errors.push_back(refFinding("missing-part", Severity::Error, use.ref(),
                                          std::string(use.ref()) + describeCircuitPart(use) +
                                              " is in the circuit but not on the board"));
    }
    reportExtraParts(context, uses, match.errors);
    for (const PartUse& use : all) {
        if (!use.found()) continue;
        const std::vector<std::string> unknown =
            use.hasUnknownPins ? uses.unknownPinsOf(use.ref()) : std::vector<std::string>{};
        checkPins(context, use, unknown, match.errors);
    }
    for (const PartUse& use : all) {
        if (use.found()) checkValue(context, use, match.errors, match.warnings);
    }
    orientParts(context, all, names, match.errors, match.warnings);
    placeNets(all, names, memory.netStart, match);
}

}  // namespace netcheck

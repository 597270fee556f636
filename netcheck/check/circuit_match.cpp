// Matching parts by reference designator. The board's parts are found through one hash map of
// refs, so the work grows with the number of pins, not with pins times parts.
#include "netcheck/check/circuit_match.hpp"

#include <algorithm>
#include <numeric>
#include <unordered_map>

#include "netcheck/model/part_kinds.hpp"
#include "netcheck/model/value.hpp"
#include "netcheck/model/wording.hpp"

namespace netcheck {

int MatchedPart::findPin(std::string_view name) const {
    for (std::size_t k = 0; k < pins.size(); ++k) {
        if (pins[k].name == name) return static_cast<int>(k);
    }
    return -1;
}

std::string MatchedPart::place(std::size_t k) const {
    if (part) return holeName(part->pins[k].hole);
    return std::string(ref) + "." + std::string(pins[k].name);
}

void MatchedPart::swapPins(std::size_t a, std::size_t b) {
    std::swap(pins[a].net, pins[b].net);
    std::swap(pins[a].meant, pins[b].meant);
}

Finding MatchedPart::finding(FindingType type, std::string message) const {
    Finding finding = Finding::of(type, std::move(message));
    finding.ref = std::string(ref);
    for (std::size_t k = 0; k < pins.size(); ++k) {
        if (part && pins[k].node >= 0) finding.holes.push_back(part->pins[k].hole);
    }
    return finding;
}

namespace {

std::vector<std::string> pinNames(std::span<const MatchedPin> pins) {
    std::vector<std::string> names;
    for (const MatchedPin& pin : pins) names.emplace_back(pin.name);
    return names;
}

// A declared pin list (empty: whatever the nets name) against the board part's, in any order.
bool samePinNames(std::vector<std::string> declared, const MatchedPart& part) {
    if (declared.empty()) return true;
    std::vector<std::string> present = pinNames(part.pins);
    std::sort(present.begin(), present.end());
    std::sort(declared.begin(), declared.end());
    return present == declared;
}

// The part's finding with " (at A1, B1)" after the message.
Finding placedPartFinding(FindingType type, const MatchedPart& part, const std::string& message) {
    std::vector<std::string> places;
    for (std::size_t k = 0; k < part.pins.size(); ++k) places.push_back(part.place(k));
    return part.finding(type, message + (places.empty() ? "" : " (at " + joined(places) + ")"));
}

// The ref's part as placed: its pins, appended to `pins`, with their nodes and islands, no net yet.
void placePart(const CheckedBoard& checked, MatchedPart& matched, std::vector<MatchedPin>& pins) {
    const Connectivity& copper = checked.copper();
    const std::size_t first = pins.size();
    if (matched.part) {
        for (const Pin& pin : matched.part->pins) {
            const int node = checked.board().contains(pin.hole) ? checked.holeIndex(pin.hole) : -1;
            pins.push_back({pin.name, pin.name, node, copper.islandOfNode(node), -1});
        }
    } else {
        for (const std::string& lug : matched.offboard->pins) {
            const int node = copper.lugNode(PinRef{std::string(matched.ref), lug});
            pins.push_back({lug, lug, node, copper.islandOfNode(node), -1});
        }
    }
    matched.pins = std::span<MatchedPin>(pins).subspan(first);
}

class Matcher {
public:
    Matcher(const CheckedBoard& checked, const Circuit& circuit)
        : checked_(checked), circuit_(circuit) {
        const Board& board = checked.board();
        refs_.reserve(board.parts.size() + board.offboard.size() + circuit.parts.size());
        match_.parts.reserve(circuit.parts.size());
        // Each board part is placed at most once, so its pins fit without the array moving.
        std::size_t pins = 0;
        for (const Part& part : board.parts) pins += part.pins.size();
        for (const OffboardPart& part : board.offboard) pins += part.pins.size();
        match_.pins.reserve(pins);
        for (const Part& part : board.parts) refs_.emplace(part.ref, Ref{&part, nullptr});
        for (const OffboardPart& part : board.offboard)
            refs_.emplace(part.ref, Ref{nullptr, &part});
    }

    CircuitMatch run() {
        for (const auto& [ref, part] : circuit_.parts) partNamed(ref).declared = &part;
        for (const auto& [name, pins] : circuit_.nets) assignNet(name, pins);
        // Declared parts come in ref order; refs that only the nets name were added after them.
        if (match_.parts.size() > circuit_.parts.size()) {
            std::stable_sort(
                match_.parts.begin(), match_.parts.end(),
                [](const MatchedPart& a, const MatchedPart& b) { return a.ref < b.ref; });
        }
        for (MatchedPart& part : match_.parts) {
            std::sort(part.unknownPins.begin(), part.unknownPins.end());
            part.unknownPins.erase(std::unique(part.unknownPins.begin(), part.unknownPins.end()),
                                   part.unknownPins.end());
        }
        reportMissingParts();
        reportExtraParts();
        for (const MatchedPart& part : match_.parts) checkPins(part);
        for (const MatchedPart& part : match_.parts) checkValue(part);
        return std::move(match_);
    }

private:
    // What a ref names: the first board part of that ref, and its place in match_.parts once
    // the circuit has named it.
    struct Ref {
        const Part* part = nullptr;
        const OffboardPart* offboard = nullptr;
        std::size_t matched = kNotNamed;
    };

    static constexpr std::size_t kNotNamed = ~std::size_t{0};

    MatchedPart& partNamed(std::string_view ref) {
        Ref& named = refs_[ref];
        if (named.matched != kNotNamed) return match_.parts[named.matched];
        named.matched = match_.parts.size();
        MatchedPart& matched = match_.parts.emplace_back();
        matched.ref = ref;
        matched.part = named.part;
        matched.offboard = named.offboard;
        if (matched.found()) placePart(checked_, matched, match_.pins);
        return matched;
    }

    bool isNamed(std::string_view ref) const { return refs_.at(ref).matched != kNotNamed; }

    // Puts the net on each board pin it names (a pin named by two nets keeps the first).
    void assignNet(std::string_view name, const std::vector<PinRef>& pins) {
        const int net = static_cast<int>(match_.nets.size());
        match_.nets.push_back(Net{name, {}});
        for (const PinRef& pin : pins) {
            MatchedPart& part = partNamed(pin.ref);
            if (!part.found()) continue;
            const int k = part.findPin(pin.pin);
            if (k < 0) {
                part.unknownPins.push_back(pin.pin);
            } else if (part.pins[static_cast<std::size_t>(k)].net < 0) {
                part.pins[static_cast<std::size_t>(k)].net = net;
            }
        }
    }

    void reportMissingParts() {
        for (const MatchedPart& part : match_.parts) {
            if (part.found()) continue;
            std::string described;
            if (part.declared && !part.declared->kind.empty()) {
                const std::string& value = part.declared->value;
                described = " (" + part.declared->kind + (value.empty() ? "" : " " + value) + ")";
            }
            match_.errors.push_back(part.finding(
                FindingType::MissingPart,
                std::string(part.ref) + described + " is in the circuit but not on the board"));
        }
    }

    void reportExtraParts() {
        const Board& board = checked_.board();
        std::vector<Finding> extra;
        for (const Part& part : board.parts) {
            if (isNamed(part.ref)) continue;
            std::vector<std::string> names;
            std::vector<Hole> holes;
            for (const Pin& pin : part.pins) {
                names.push_back(holeName(pin.hole));
                holes.push_back(pin.hole);
            }
            extra.push_back(Finding::of(FindingType::ExtraPart,
                                        part.ref + " (" + part.kind + ") is on the board (at " +
                                            joined(names) + ") but not in the circuit",
                                        std::move(holes)));
            extra.back().ref = part.ref;
        }
        for (const OffboardPart& part : board.offboard) {
            if (isNamed(part.ref)) continue;
            extra.push_back(Finding::of(FindingType::ExtraPart,
                                        part.ref + " (" + part.kind +
                                            ", off the board) is wired up but not in the circuit"));
            extra.back().ref = part.ref;
        }
        std::stable_sort(extra.begin(), extra.end(),
                         [](const Finding& a, const Finding& b) { return a.ref < b.ref; });
        match_.errors.insert(match_.errors.end(), extra.begin(), extra.end());
    }

    void checkPins(const MatchedPart& part) {
        if (!part.found()) return;
        std::string problem;
        if (!part.unknownPins.empty()) {
            problem = "the circuit uses pin" +
                      std::string(part.unknownPins.size() > 1 ? "s " : " ") +
                      joined(part.unknownPins);
        } else if (part.declared && !samePinNames(part.declared->pins, part)) {
            problem = "the circuit declares pins " + joined(part.declared->pins);
        }
        if (problem.empty()) return;
        problem += ", but the board part has " + joined(pinNames(part.pins));
        match_.errors.push_back(placedPartFinding(FindingType::PinMismatch, part,
                                                  std::string(part.ref) + ": " + problem));
    }

    // Quantities (resistance, capacitance ...) compare as numbers and differ as an error; other
    // values (type numbers) compare as text and differ as a warning. An empty circuit value is
    // don't-care.
    void checkValue(const MatchedPart& part) {
        if (!part.found() || !part.declared) return;
        const std::string& onBoard = part.value();
        const std::string& intended = part.declared->value;
        if (intended.empty() || onBoard == intended || sameValue(onBoard, intended)) return;
        const PartKind* kind = findPartKind(part.kind());
        if (kind == nullptr) kind = findPartKind(part.declared->kind);
        const bool quantity = kind != nullptr && kind->quantity;
        const std::string shown = onBoard.empty() ? "no value" : "\"" + onBoard + "\"";
        Finding finding = placedPartFinding(
            quantity ? FindingType::ValueMismatch : FindingType::ValueDiffers, part,
            std::string(part.ref) + " is " + shown + " on the board but \"" + intended +
                "\" in the circuit");
        (quantity ? match_.errors : match_.warnings).push_back(std::move(finding));
    }

    const CheckedBoard& checked_;
    const Circuit& circuit_;
    std::unordered_map<std::string_view, Ref> refs_;  // match_.parts indices hold until sorted
    CircuitMatch match_;
};

// The pins of every net, in ref order, each part's pins in board order: counted per net first, so
// each net's pins are one stretch of match.netPins.
void placeNets(CircuitMatch& match) {
    auto forEachPlaced = [&](auto visit) {
        for (const MatchedPart& part : match.parts) {
            for (const MatchedPin& pin : part.pins) {
                if (part.unknownPins.empty() && pin.net >= 0 && pin.node >= 0) visit(part, pin);
            }
        }
    };
    std::vector<std::size_t> start(match.nets.size() + 1, 0);
    forEachPlaced([&](const MatchedPart&, const MatchedPin& pin) {
        ++start[static_cast<std::size_t>(pin.net) + 1];
    });
    std::partial_sum(start.begin(), start.end(), start.begin());
    match.netPins.resize(start.back());
    std::vector<std::size_t> next(start.begin(), start.end() - 1);
    forEachPlaced([&](const MatchedPart& part, const MatchedPin& pin) {
        match.netPins[next[static_cast<std::size_t>(pin.net)]++] =
            NetPin{part.ref, pin.meant, pin.node, pin.island};
    });
    for (std::size_t n = 0; n < match.nets.size(); ++n) {
        match.nets[n].pins =
            std::span<const NetPin>(match.netPins).subspan(start[n], start[n + 1] - start[n]);
    }
}

}  // namespace

std::vector<NetPiece> netPieces(const Net& net) {
    std::vector<const NetPin*> pins;
    for (const NetPin& pin : net.pins) pins.push_back(&pin);
    std::sort(pins.begin(), pins.end(), [](const NetPin* a, const NetPin* b) {
        return a->island != b->island ? a->island < b->island : *a < *b;
    });
    std::vector<NetPiece> pieces;
    for (const NetPin* pin : pins) {
        if (pieces.empty() || pieces.back().island != pin->island)
            pieces.push_back({pin->island, {}});
        pieces.back().pins.push_back(pin);
    }
    std::sort(pieces.begin(), pieces.end(), [](const NetPiece& a, const NetPiece& b) {
        return *a.pins.front() < *b.pins.front();
    });
    return pieces;
}

CircuitMatch matchCircuit(const CheckedBoard& checked, const Circuit& circuit) {
    CircuitMatch match = Matcher(checked, circuit).run();
    orientParts(checked, match);
    placeNets(match);
    return match;
}

}  // namespace netcheck

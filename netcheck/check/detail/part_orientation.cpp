// Orienting parts against the copper. The score of an orientation is the number of pins of other
// parts that the copper already joins to each of the part's pins and that belong to the same
// intended net: the way round that agrees best with the rest of the board is the one meant.
#include <algorithm>
#include <array>
#include <functional>
#include <map>
#include <optional>

#include "netcheck/check/circuit_match.hpp"
#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

namespace {

enum class Freedom { Fixed, EndForEnd, PotEnds, Polarised };

Freedom freedomOf(const MatchedPart& part) {
    if (!part.found() || !part.unknownPins.empty()) return Freedom::Fixed;
    const PartKind* kind = findPartKind(part.kind());
    if (kind == nullptr) return Freedom::Fixed;  // unknown kinds match pin names exactly
    if (kind->name == "pot" || kind->name == "trimmer") {
        const bool hasLugs =
            part.findPin("1") >= 0 && part.findPin("2") >= 0 && part.findPin("3") >= 0;
        return hasLugs ? Freedom::PotEnds : Freedom::Fixed;
    }
    if (part.offboard) return Freedom::Fixed;
    if (part.pins.size() == 2) return kind->polarised ? Freedom::Polarised : Freedom::EndForEnd;
    if (kind->polarised && part.pins.size() == 3 && kind->pins.size() == 3)
        return Freedom::Polarised;
    return Freedom::Fixed;
}

// How many pins of each intended net sit in each island. Pins outside the board and pins the
// circuit does not care about count nowhere. Most islands carry one net, so its count lives in
// a plain array by island; only where nets meet (a short) do counts go to a map.
class NetCounts {
public:
    NetCounts(int islands, std::size_t nets)
        : first_(static_cast<std::size_t>(islands)), total_(nets, 0) {}

    void add(const MatchedPart& part, int delta) {
        for (const MatchedPin& pin : part.pins) {
            if (pin.net < 0 || pin.island < 0) continue;
            NetCount& first = first_[static_cast<std::size_t>(pin.island)];
            if (first.net < 0) first.net = pin.net;
            (first.net == pin.net ? first.count : others_[{pin.island, pin.net}]) += delta;
            total_[static_cast<std::size_t>(pin.net)] += delta;
        }
    }

    /// Agreement of the part as it is now oriented (its own pins must have been taken out).
    int score(const MatchedPart& part) const {
        int total = 0;
        for (const MatchedPin& pin : part.pins) total += at(pin);
        return total;
    }

    int at(const MatchedPin& pin) const {
        if (pin.net < 0 || pin.island < 0) return 0;
        const NetCount& first = first_[static_cast<std::size_t>(pin.island)];
        if (first.net == pin.net) return first.count;
        const auto it = others_.find({pin.island, pin.net});
        return it == others_.end() ? 0 : it->second;
    }

    /// Pins of `net` on the board, in any island.
    int total(int net) const { return net < 0 ? 0 : total_[static_cast<std::size_t>(net)]; }

private:
    struct NetCount {
        int net = -1;
        int count = 0;
    };
    std::vector<NetCount> first_;                // by island: the first net seen there
    std::map<std::pair<int, int>, int> others_;  // (island, net) for the other nets
    std::vector<int> total_;                     // by net
};

// "Clearly better": the other way round explains at least two joins and more than twice as many
// as the placement does.
bool clearlyBetter(int other, int placed) {
    return other >= 2 && other > 2 * placed;
}

std::string partLabel(const MatchedPart& part) {
    return std::string(part.ref) + " (" + part.kind() + ")";
}

// Returns whether the part was turned round. A tie is broken by `eitherWay()`: the end-for-end
// parts counted either way round (a neighbour that could be turned still says which nets meet in
// an island; the part's own counts are the same both ways round). A full tie keeps the part as
// written.
bool chooseEndForEnd(MatchedPart& part, NetCounts& counts,
                     const std::function<const NetCounts&()>& eitherWay) {
    counts.add(part, -1);
    const int placed = counts.score(part);
    part.swapPins(0, 1);
    const int swapped = counts.score(part);
    bool better = swapped > placed;
    if (swapped == placed && part.pins[0].net != part.pins[1].net) {
        const int swappedEitherWay = eitherWay().score(part);
        part.swapPins(0, 1);
        better = swappedEitherWay > eitherWay().score(part);
        part.swapPins(0, 1);
    }
    if (!better) part.swapPins(0, 1);
    counts.add(part, +1);
    return better;
}

// Pots whose end lugs agree better swapped, with the wiper agreeing as placed, are taken as
// swapped: the control works backwards but nothing is shorted.
void checkPot(MatchedPart& part, NetCounts& counts, const std::vector<Net>& nets,
              std::vector<Finding>& warnings) {
    const auto one = static_cast<std::size_t>(part.findPin("1"));
    const auto wiper = static_cast<std::size_t>(part.findPin("2"));
    const auto three = static_cast<std::size_t>(part.findPin("3"));
    counts.add(part, -1);
    const int placed = counts.score(part);
    const int wiperNet = part.pins[wiper].net;
    const bool wiperRight = counts.at(part.pins[wiper]) > 0 || counts.total(wiperNet) == 0;
    part.swapPins(one, three);
    if (counts.score(part) > placed && wiperRight) {
        auto netLabel = [&](int net) {
            return net < 0 ? std::string("nothing")
                           : "net " + std::string(nets[static_cast<std::size_t>(net)].name);
        };
        warnings.push_back(part.finding(
            FindingType::PotReversed,
            partLabel(part) +
                " end lugs 1 and 3 are swapped against the circuit: " + part.place(one) +
                " is on " + netLabel(part.pins[one].net) + ", " + part.place(three) + " on " +
                netLabel(part.pins[three].net) + " (the control works backwards)"));
    } else {
        part.swapPins(one, three);
    }
    counts.add(part, +1);
}

std::string pinList(const MatchedPart& part, const std::array<std::size_t, 3>& order) {
    std::string text;
    for (std::size_t k = 0; k < 3; ++k) {
        text +=
            (k > 0 ? ", " : "") + std::string(part.pins[order[k]].name) + " in " + part.place(k);
    }
    return text;
}

// Polarised parts keep their pin names: every other order of the pins (the other way round, for
// two) is tried, and one that agrees clearly better is a reversed-part error.
void checkPolarised(MatchedPart& part, NetCounts& counts, const std::vector<Net>& nets,
                    std::vector<Finding>& errors) {
    const std::size_t n = part.pins.size();  // 2 or 3
    std::array<int, 3> placedNets{};
    for (std::size_t k = 0; k < n; ++k) placedNets[k] = part.pins[k].net;
    std::array<std::size_t, 3> order{0, 1, 2};
    std::array<std::size_t, 3> best = order;
    counts.add(part, -1);
    const int placed = counts.score(part);
    int bestScore = placed;
    while (std::next_permutation(order.begin(), order.begin() + static_cast<std::ptrdiff_t>(n))) {
        for (std::size_t k = 0; k < n; ++k) part.pins[k].net = placedNets[order[k]];
        if (const int score = counts.score(part); score > bestScore) {
            bestScore = score;
            best = order;
        }
    }
    for (std::size_t k = 0; k < n; ++k) part.pins[k].net = placedNets[k];
    counts.add(part, +1);
    if (!clearlyBetter(bestScore, placed)) return;
    // Two pins: the other lead's net, which the first pin's hole carries.
    const int swappedNet = placedNets[1];
    const std::string message =
        n == 3 ? partLabel(part) + " pins look out of order: the copper fits " +
                     pinList(part, best) + " (placed: " + pinList(part, {0, 1, 2}) + ")"
               : partLabel(part) + " looks reversed: " + std::string(part.pins[0].name) +
                     " is in " + part.place(0) + ", " +
                     (swappedNet < 0
                          ? "where the other lead belongs"
                          : "which carries net " +
                                std::string(nets[static_cast<std::size_t>(swappedNet)].name));
    errors.push_back(part.finding(FindingType::ReversedPart, message));
}

}  // namespace

void orientParts(const CheckedBoard& checked, CircuitMatch& match) {
    std::vector<MatchedPart>& parts = match.parts;
    std::vector<Freedom> freedom;
    for (const MatchedPart& part : parts) freedom.push_back(freedomOf(part));
    if (std::all_of(freedom.begin(), freedom.end(), [](Freedom f) { return f == Freedom::Fixed; }))
        return;
    const int islands = checked.copper().islandCount();
    NetCounts counts(islands, match.nets.size());
    for (const MatchedPart& part : parts) counts.add(part, +1);
    // The tie-break counts: each end-for-end part added as placed and turned round. Most of their
    // islands then carry two nets, a map node each, so they are built on the first tie, not before
    // (most boards have none).
    std::optional<NetCounts> eitherWay;
    const std::function<const NetCounts&()> eitherWayCounts = [&]() -> const NetCounts& {
        if (eitherWay) return *eitherWay;
        eitherWay.emplace(islands, match.nets.size());
        for (std::size_t p = 0; p < parts.size(); ++p) {
            for (int turn = 0; turn < 2 && freedom[p] == Freedom::EndForEnd; ++turn) {
                eitherWay->add(parts[p], +1);
                parts[p].swapPins(0, 1);
            }
        }
        return *eitherWay;
    };
    // Two rounds, so a part flipped in the first round is seen by its neighbours in the second.
    bool flipped = true;
    for (int round = 0; round < 2 && flipped; ++round) {
        flipped = false;
        for (std::size_t p = 0; p < parts.size(); ++p) {
            if (freedom[p] == Freedom::EndForEnd)
                flipped = chooseEndForEnd(parts[p], counts, eitherWayCounts) || flipped;
        }
    }
    for (std::size_t p = 0; p < parts.size(); ++p) {
        if (freedom[p] == Freedom::PotEnds) checkPot(parts[p], counts, match.nets, match.warnings);
        if (freedom[p] == Freedom::Polarised)
            checkPolarised(parts[p], counts, match.nets, match.errors);
    }
}

}  // namespace netcheck

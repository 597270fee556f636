// Orienting parts against the copper. The score of an orientation is the number of pins of other
// parts that the copper already joins to each of the part's pins and that belong to the same
// intended net: the way round that agrees best with the rest of the board is the one meant.
#include "netcheck/check/detail/part_orientation.hpp"

#include <algorithm>
#include <array>
#include <cstdint>
#include <unordered_map>

#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

namespace {

enum class Freedom { Fixed, EndForEnd, PotEnds, Polarised2, Polarised3 };

Freedom freedomOf(const PartUse& use) {
    if (!use.found() || use.hasUnknownPins) return Freedom::Fixed;
    const PartKind* kind = use.board.known;
    if (kind == nullptr) return Freedom::Fixed;  // unknown kinds match pin names exactly
    if (kind->name == "pot" || kind->name == "trimmer") {
        const bool hasLugs =
            use.findPin("1") >= 0 && use.findPin("2") >= 0 && use.findPin("3") >= 0;
        return hasLugs ? Freedom::PotEnds : Freedom::Fixed;
    }
    if (use.offboard) return Freedom::Fixed;
    if (use.pinCount() == 2) return kind->polarised ? Freedom::Polarised2 : Freedom::EndForEnd;
    if (kind->polarised && use.pinCount() == 3 && kind->pins.size() == 3) {
        return Freedom::Polarised3;
    }
    return Freedom::Fixed;
}

int islandOf(const PartUse& use, int pin) {
    return use.islands()[static_cast<std::size_t>(pin)];
}

// One sortable number for a (net, island) pair.
std::uint64_t key(int net, int island) {
    return (static_cast<std::uint64_t>(static_cast<std::uint32_t>(net)) << 32) |
           static_cast<std::uint32_t>(island);
}

// How many pins of each intended net sit in each island. Most islands carry one net, so the count
// lives in a per-island array; only pins of a second net in an island go to a hash map.
class NetCounts {
public:
    NetCounts(int islandCount, std::span<const PartUse> uses, int netCount)
        : first_(static_cast<std::size_t>(islandCount)),
          totals_(static_cast<std::size_t>(netCount), 0) {
        for (const PartUse& use : uses) add(use, +1);
    }

    void add(const PartUse& use, int delta) {
        for (int k = 0; k < use.pinCount(); ++k) {
            const int net = use.net()[static_cast<std::size_t>(k)];
            if (net < 0) continue;
            slot(net, islandOf(use, k)) += delta;
            totals_[static_cast<std::size_t>(net)] += delta;
        }
    }

    int at(const PartUse& use, int pin) const {
        const int net = use.net()[static_cast<std::size_t>(pin)];
        if (net < 0) return 0;
        const int island = islandOf(use, pin);
        const First& first = first_[static_cast<std::size_t>(island)];
        if (first.net == net) return first.count;
        auto it = others_.find(key(net, island));
        return it == others_.end() ? 0 : it->second;
    }

    /// Agreement of the part as presently oriented (its own pins must have been removed).
    int score(const PartUse& use) const {
        int total = 0;
        for (int k = 0; k < use.pinCount(); ++k) total += at(use, k);
        return total;
    }

    int total(int net) const { return net < 0 ? 0 : totals_[static_cast<std::size_t>(net)]; }

private:
    int& slot(int net, int island) {
        First& first = first_[static_cast<std::size_t>(island)];
        if (first.net < 0) first.net = net;
        if (first.net == net) return first.count;
        return others_[key(net, island)];
    }
    // The first net seen in an island and its count side by side: one cache line per look.
    struct First {
        int net = -1;
        int count = 0;
    };
    std::vector<First> first_;
    std::unordered_map<std::uint64_t, int> others_;
    std::vector<int> totals_;
};

// "Clearly better": the other way round explains at least two joins and more than twice as many
// as the placement does.
bool clearlyBetter(int other, int placed) {
    return other >= 2 && other > 2 * placed;
}

std::string partLabel(const Board& board, const PartUse& use) {
    return std::string(use.ref()) + " (" + use.kind(board) + ")";
}

std::vector<Hole> partHoles(const CheckContext& context, const PartUse& use) {
    std::vector<Hole> holes;
    for (int node : use.nodes()) {
        if (context.isHoleNode(node)) holes.push_back(context.holeAt(node));
    }
    return holes;
}

Finding partFinding(std::string type, Severity severity, const CheckContext& context,
                    const PartUse& use, std::string message) {
    Finding finding;
    finding.type = std::move(type);
    finding.severity = severity;
    finding.ref = std::string(use.ref());
    finding.message = std::move(message);
    finding.holes = partHoles(context, use);
    return finding;
}

// Pins of end-for-end parts counted under both of their nets: a neighbour that could be turned
// round still says which nets meet in an island. Used only to break ties. The (net, island) keys
// are kept sorted, so a count is the length of a run of equal keys.
class FlexibleCounts {
public:
    void build(std::span<const PartUse> uses, const std::vector<Freedom>& freedom) {
        for (std::size_t u = 0; u < uses.size(); ++u) {
            if (freedom[u] != Freedom::EndForEnd) continue;
            for (int k = 0; k < 2; ++k) {
                for (int net : uses[u].net()) {
                    if (net >= 0) keys_.push_back(key(net, islandOf(uses[u], k)));
                }
            }
        }
        std::sort(keys_.begin(), keys_.end());
    }

    /// Agreement of `use` as oriented, without its own contribution.
    int score(const PartUse& use) const {
        int total = 0;
        for (int k = 0; k < 2; ++k) {
            const int net = use.net()[static_cast<std::size_t>(k)];
            if (net < 0) continue;
            const auto [first, last] =
                std::equal_range(keys_.begin(), keys_.end(), key(net, islandOf(use, k)));
            if (first == last) continue;
            int own = 0;
            for (int j = 0; j < 2; ++j) own += islandOf(use, j) == islandOf(use, k) ? 1 : 0;
            total += static_cast<int>(last - first) - own;
        }
        return total;
    }

private:
    std::vector<std::uint64_t> keys_;
};

// The flexible counts are only needed on a tie, so they are built on the first one.
class LazyFlexibleCounts {
public:
    LazyFlexibleCounts(std::span<const PartUse> uses, const std::vector<Freedom>& freedom)
        : uses_(uses), freedom_(freedom) {}
    const FlexibleCounts& get() {
        if (!built_) counts_.build(uses_, freedom_);
        built_ = true;
        return counts_;
    }

private:
    std::span<const PartUse> uses_;
    const std::vector<Freedom>& freedom_;
    FlexibleCounts counts_;
    bool built_ = false;
};

// Returns whether the part was turned round.
bool chooseEndForEnd(PartUse& use, NetCounts& counts, LazyFlexibleCounts& flexible) {
    counts.add(use, -1);
    const int placed = counts.score(use);
    use.swapPins(0, 1);
    const int swapped = counts.score(use);
    bool better = swapped > placed;
    if (swapped == placed && use.net()[0] != use.net()[1]) {
        const int swappedFlexible = flexible.get().score(use);
        use.swapPins(0, 1);
        better = swappedFlexible > flexible.get().score(use);
        use.swapPins(0, 1);
    }
    if (!better) use.swapPins(0, 1);  // a full tie keeps the part as written
    counts.add(use, +1);
    return better;
}

void checkPot(const CheckContext& context, PartUse& use, NetCounts& counts,
              const std::vector<std::string_view>& netNames, std::vector<Finding>& warnings) {
    const int one = use.findPin("1");
    const int wiper = use.findPin("2");
    const int three = use.findPin("3");
    counts.add(use, -1);
    const int placed = counts.score(use);
    const int wiperNet = use.net()[static_cast<std::size_t>(wiper)];
    const bool wiperRight = counts.at(use, wiper) > 0 || counts.total(wiperNet) == 0;
    use.swapPins(one, three);
    const int swapped = counts.score(use);
    if (swapped > placed && wiperRight) {
        const int net1 = use.net()[static_cast<std::size_t>(one)];
        const int net3 = use.net()[static_cast<std::size_t>(three)];
        auto netLabel = [&](int net) {
            return net < 0 ? std::string("nothing")
                           : "net " + std::string(netNames[static_cast<std::size_t>(net)]);
        };
        warnings.push_back(
            partFinding("pot-reversed", Severity::Warning, context, use,
                        partLabel(context.board(), use) +
                            " end lugs 1 and 3 are swapped against the circuit: " +
                            context.nodeName(use.nodes()[static_cast<std::size_t>(one)]) +
                            " is on " + netLabel(net1) + ", " +
                            context.nodeName(use.nodes()[static_cast<std::size_t>(three)]) +
                            " on " + netLabel(net3) + " (the control works backwards)"));
    } else {
        use.swapPins(one, three);
    }
    counts.add(use, +1);
}

void checkPolarised2(const CheckContext& context, PartUse& use, NetCounts& counts,
                     const std::vector<std::string_view>& netNames, std::vector<Finding>& errors) {
    counts.add(use, -1);
    const int placed = counts.score(use);
    use.swapPins(0, 1);
    const int swapped = counts.score(use);
    const int netAtFirst = use.net()[0];
    use.swapPins(0, 1);
    counts.add(use, +1);
    if (!clearlyBetter(swapped, placed)) return;
    const std::string carries =
        netAtFirst < 0
            ? "where the other lead belongs"
            : "which carries net " + std::string(netNames[static_cast<std::size_t>(netAtFirst)]);
    errors.push_back(partFinding("reversed-part", Severity::Error, context, use,
                                 partLabel(context.board(), use) +
                                     " looks reversed: " + use.pinName(0) + " is in " +
                                     context.nodeName(use.nodes()[0]) + ", " + carries));
}

std::string pinList(const CheckContext& context, const PartUse& use,
                    const std::array<int, 3>& order) {
    std::string text;
    for (int k = 0; k < 3; ++k) {
        if (k > 0) text += ", ";
        text += use.pinName(order[static_cast<std::size_t>(k)]) + " in " +
                context.nodeName(use.nodes()[static_cast<std::size_t>(k)]);
    }
    return text;
}

void checkPolarised3(const CheckContext& context, PartUse& use, NetCounts& counts,
                     std::vector<Finding>& errors) {
    counts.add(use, -1);
    const std::array<int, 3> placedNets{use.net()[0], use.net()[1], use.net()[2]};
    const int placed = counts.score(use);
    std::array<int, 3> order{0, 1, 2};
    std::array<int, 3> best = order;
    int bestScore = placed;
    while (std::next_permutation(order.begin(), order.end())) {
        for (std::size_t k = 0; k < 3; ++k)
            use.net()[k] = placedNets[static_cast<std::size_t>(order[k])];
        const int score = counts.score(use);
        if (score > bestScore) {
            bestScore = score;
            best = order;
        }
    }
    std::copy(placedNets.begin(), placedNets.end(), use.net().begin());
    counts.add(use, +1);
    if (!clearlyBetter(bestScore, placed)) return;
    const std::array<int, 3> asPlaced{0, 1, 2};
    errors.push_back(partFinding(
        "reversed-part", Severity::Error, context, use,
        partLabel(context.board(), use) + " pins look out of order: the copper fits " +
            pinList(context, use, best) + " (placed: " + pinList(context, use, asPlaced) + ")"));
}

}  // namespace

void orientParts(const CheckContext& context, std::span<PartUse> uses,
                 const std::vector<std::string_view>& netNames, std::vector<Finding>& errors,
                 std::vector<Finding>& warnings) {
    std::vector<Freedom> freedom;
    freedom.reserve(uses.size());
    bool any = false;
    for (const PartUse& use : uses) {
        freedom.push_back(freedomOf(use));
        any = any || freedom.back() != Freedom::Fixed;
    }
    if (!any) return;
    NetCounts counts(context.copper().islandCount(), uses, static_cast<int>(netNames.size()));
    // Flexible counts do not depend on orientation, so building them late changes nothing.
    LazyFlexibleCounts flexible(uses, freedom);
    // Two rounds, so a part flipped in the first round is seen by its neighbours in the second
    // (when nothing was flipped, the second round would see and decide exactly the same).
    bool flipped = true;
    for (int round = 0; round < 2 && flipped; ++round) {
        flipped = false;
        for (std::size_t u = 0; u < uses.size(); ++u) {
            if (freedom[u] != Freedom::EndForEnd) continue;
            flipped = chooseEndForEnd(uses[u], counts, flexible) || flipped;
        }
    }
    for (std::size_t u = 0; u < uses.size(); ++u) {
        switch (freedom[u]) {
            case Freedom::PotEnds:
                checkPot(context, uses[u], counts, netNames, warnings);
                break;
            case Freedom::Polarised2:
                checkPolarised2(context, uses[u], counts, netNames, errors);
                break;
            case Freedom::Polarised3:
                checkPolarised3(context, uses[u], counts, errors);
                break;
            default:
                break;
        }
    }
}

}  // namespace netcheck

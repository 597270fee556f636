// Matching the board's parts to the intended circuit by reference designator: missing, extra and
// mismatched parts, the orientation of parts that may sit either way round, and reversed parts
// (private to the checker).
#pragma once

#include <span>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "netcheck/check/detail/cache_line_allocator.hpp"
#include "netcheck/check/detail/check_context.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/check/detail/part_use.hpp"
#include "netcheck/check/detail/ref_table.hpp"

namespace netcheck {

/// A pin of an intended net as placed on the board: the circuit's name for it, its node and its
/// island. The names point into the circuit and the board, which outlive the check.
struct NetPin {
    const std::string* ref = nullptr;  // pointers, so making one reads neither name
    const std::string* pin = nullptr;
    int node = 0;
    int island = 0;

    PinRef pinRef() const { return PinRef{*ref, *pin}; }
    std::string name() const { return *ref + "." + *pin; }
    /// The order of PinRef: by ref, then by pin name.
    bool operator<(const NetPin& other) const {
        return *ref != *other.ref ? *ref < *other.ref : *pin < *other.pin;
    }
};

/// An intended net with the pins the board actually has (pins of missing parts left out).
struct PlacedNet {
    std::string_view name;
    std::span<const NetPin> pins;  ///< into CircuitMatch::netPins
};

struct CircuitMatch {
    std::vector<Finding> errors;    ///< part findings, by ref
    std::vector<Finding> warnings;  ///< value-differs, pot-reversed
    std::vector<PlacedNet> nets;    ///< in circuit order (sorted by name)
    std::vector<NetPin> netPins;    ///< the pins of every net, net after net

    // The nets point into netPins: moving keeps them valid, a copy would not.
    CircuitMatch() = default;
    CircuitMatch(CircuitMatch&&) = default;
    CircuitMatch& operator=(CircuitMatch&&) = default;
    CircuitMatch(const CircuitMatch&) = delete;
    CircuitMatch& operator=(const CircuitMatch&) = delete;
};

/// The matcher's working lists, kept by the caller between checks so that a re-check reuses
/// their memory (what is in them between calls means nothing).
struct MatchMemory {
    RefTable refs;
    std::vector<PartUse, CacheLineAllocator<PartUse>> uses;
    std::vector<int> pool;
    std::vector<int> useOfPart;
    std::vector<int> useOfOffboard;
    std::vector<int> order;
    std::vector<int> slotOfUse;
    std::vector<int> useInSlot;
    std::vector<std::pair<std::string_view, std::string_view>> unknownPins;
    std::vector<char> mentionedPart;
    std::vector<char> mentionedOffboard;
    std::vector<std::string_view> netNames;
    std::vector<std::size_t> netStart;
};

/// Matches the board's parts and pins to `circuit`, into `match` (whatever it held is replaced).
void matchCircuit(const CheckContext& context, const Circuit& circuit, MatchMemory& memory,
                  CircuitMatch& match);

}  // namespace netcheck

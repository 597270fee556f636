// One board part as the circuit uses it: where its pins are and which intended net each pin is
// meant to carry (private to the checker).
#pragma once

#include <cstdint>
#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/check/detail/packed_name.hpp"
#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

/// What the board says of a placed part, read once in the board's order: later passes go
/// through the circuit's order, and reading the board again there would jump around in memory.
struct BoardPartFacts {
    union {
        const Pin* pins = nullptr;  ///< on-board pins (of an on-board part)
        const std::string* lugs;    ///< off-board lug names (of an off-board part)
    };
    std::uint64_t valueKey = 0;       ///< ValueKey of the part's value
    const PartKind* known = nullptr;  ///< the kind's table row; null for unknown kinds
};

/// A board part, or a ref the circuit names that the board lacks. Its per-pin arrays lie side by
/// side in one pool owned by the matcher, so placing a part allocates nothing of its own and a
/// part's pins share a cache line or two. A use is the size of one cache line (and the matcher
/// keeps its uses line-aligned), so the passes that look uses up by ref wait for one line each.
struct PartUse {
    static constexpr int kArraysPerPin = 5;

    const std::string* refName = nullptr;  ///< the board's or the circuit's copy of the ref
    int* pool = nullptr;                   ///< kArraysPerPin * pins ints
    int pins = 0;                          ///< number of board pins
    int index = -1;                        ///< index into board.parts / board.offboard; -1 missing
    bool mentioned = false;                ///< the circuit names this ref
    bool offboard = false;                 ///< board part is in board.offboard
    bool valueDiffers = false;             ///< board and circuit values differ (when found)
    bool declaresPins = false;             ///< the circuit part lists its pin names
    bool hasUnknownPins = false;           ///< the circuit uses pins the board part lacks
    const CircuitPart* circuitPart = nullptr;  ///< null when the ref only appears in nets
    BoardPartFacts board;                      ///< valid when found()

    /// Node of each board pin, in board pin order.
    std::span<int> nodes() const { return array(0); }
    /// Island of each board pin.
    std::span<int> islands() const { return array(1); }
    /// Intended net at each board pin, -1 = don't care.
    std::span<int> net() const { return array(2); }
    /// The circuit's name at each board pin (a pin index).
    std::span<int> nameOf() const { return array(3); }
    /// PinKey of each board pin name.
    std::span<int> pinKeys() const { return array(4); }

    std::string_view ref() const { return *refName; }
    bool found() const { return index >= 0; }
    int pinCount() const { return pins; }
    const std::string& kind(const Board& on) const {
        const auto at = static_cast<std::size_t>(index);
        return offboard ? on.offboard[at].kind : on.parts[at].kind;
    }
    const std::string& value(const Board& on) const {
        const auto at = static_cast<std::size_t>(index);
        return offboard ? on.offboard[at].value : on.parts[at].value;
    }
    /// Whether the board value is `text` as written (without reading the board when both are
    /// short).
    bool valueIs(const Board& on, const std::string& text) const {
        const std::uint64_t key = ValueKey::of(text);
        if (key != ValueKey::kLong || board.valueKey != ValueKey::kLong)
            return key == board.valueKey;
        return value(on) == text;
    }
    /// Board pin name at `pin`.
    const std::string& pinName(int pin) const {
        const auto at = static_cast<std::size_t>(pin);
        return offboard ? board.lugs[at] : board.pins[at].name;
    }
    /// Board pin index of a pin name; -1 when the part has no such pin.
    int findPin(std::string_view name) const { return findPin(PinKey::of(name), name); }
    /// The same with the name's PinKey known: a std::string `name` is then read only when it is
    /// too long to pack (on a large board the circuit's pin names lie far apart in memory).
    template <typename Name>
    int findPin(std::uint32_t nameKey, const Name& name) const {
        const auto key = static_cast<int>(nameKey);
        for (int k = 0; k < pinCount(); ++k) {
            if (pinKeys()[static_cast<std::size_t>(k)] != key) continue;
            if (key != static_cast<int>(PinKey::kLong) || pinName(k) == name) return k;
        }
        return -1;
    }
    /// Swaps what the circuit expects at two board pins (the part placed the other way round).
    void swapPins(int a, int b) {
        std::swap(net()[static_cast<std::size_t>(a)], net()[static_cast<std::size_t>(b)]);
        std::swap(nameOf()[static_cast<std::size_t>(a)], nameOf()[static_cast<std::size_t>(b)]);
    }

private:
    std::span<int> array(int which) const {
        return std::span<int>(pool + which * pins, static_cast<std::size_t>(pins));
    }
};
static_assert(sizeof(PartUse) == 64);

}  // namespace netcheck

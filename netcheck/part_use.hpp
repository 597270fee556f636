// One board part as the circuit uses it: where its pins are and which intended net each pin is
// meant to carry (private to the checker).
#pragma once

#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "board.hpp"
#include "check_context.hpp"
#include "circuit.hpp"

namespace netcheck {

/// The three per-pin spans point into one pool owned by the matcher, so placing a part allocates
/// nothing of its own.
struct PartUse {
    std::string_view ref;
    const CircuitPart* circuitPart = nullptr;  ///< null when the ref only appears in nets
    bool offboard = false;                     ///< board part is in board.offboard
    int index = -1;                            ///< index into board.parts / board.offboard; -1 missing
    std::span<int> nodes;                      ///< node of each board pin, in board pin order
    std::span<int> net;                        ///< intended net at each board pin, -1 = don't care
    std::span<int> nameOf;                     ///< the circuit's name at each board pin (a pin index)
    std::vector<std::string> unknownPins;      ///< pins the circuit uses that the board part lacks

    bool found() const { return index >= 0; }
    int pinCount() const { return static_cast<int>(nodes.size()); }
    /// Board pin name at `pin`.
    const std::string& pinName(const Board& board, int pin) const {
        const auto at = static_cast<std::size_t>(pin);
        return offboard ? board.offboard[static_cast<std::size_t>(index)].pins[at]
                        : board.parts[static_cast<std::size_t>(index)].pins[at].name;
    }
    const std::string& kind(const Board& board) const {
        const auto at = static_cast<std::size_t>(index);
        return offboard ? board.offboard[at].kind : board.parts[at].kind;
    }
    const std::string& value(const Board& board) const {
        const auto at = static_cast<std::size_t>(index);
        return offboard ? board.offboard[at].value : board.parts[at].value;
    }
    /// Board pin index of a pin name; -1 when the part has no such pin.
    int findPin(const Board& board, std::string_view name) const {
        for (int k = 0; k < pinCount(); ++k) {
            if (pinName(board, k) == name) return k;
        }
        return -1;
    }
    /// Swaps what the circuit expects at two board pins (the part placed the other way round).
    void swapPins(int a, int b) {
        std::swap(net[static_cast<std::size_t>(a)], net[static_cast<std::size_t>(b)]);
        std::swap(nameOf[static_cast<std::size_t>(a)], nameOf[static_cast<std::size_t>(b)]);
    }
};

}  // namespace netcheck

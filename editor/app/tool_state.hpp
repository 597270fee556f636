// The active tool and what it is in the middle of (first end picked, a drag under way ...).
#pragma once

#include <optional>
#include <string>

#include <imgui.h>

#include "netcheck/model/board.hpp"

namespace stripsmith {

enum class Tool { Select, Place, Link, Cut, Wire };

struct ToolState {
    Tool tool = Tool::Select;

    // Placing parts.
    std::string placeKind = "resistor";
    std::string placeValue = "10k";
    bool standing = false;              ///< two-lead parts stand on end (one hole of span)
    int quarterTurns = 0;               ///< multi-pin parts
    int pinCount = 8;                   ///< ic and header pin count
    std::optional<netcheck::Hole> firstEnd;  ///< two-lead part or link: first end picked
    std::optional<netcheck::Hole> pressHole; ///< where the press of a possible drag began

    std::string partSearch;             ///< the Parts panel's search box: kinds shown by name

    // Wires.
    std::string wireColour = "red";
    std::optional<netcheck::Endpoint> wireStart;

    // Select tool gestures.
    enum class Gesture { None, Move, Stretch, Box };
    Gesture gesture = Gesture::None;
    netcheck::Hole gestureStart;        ///< hole cell under the mouse (on or off the board) at the start
    int movedRows = 0;                  ///< already applied by the move gesture
    int movedCols = 0;
    std::size_t stretchPart = 0;
    std::size_t stretchPin = 0;
    ImVec2 boxStart{0, 0};              ///< board units

    /// Forget any half-done gesture (Escape, tool change).
    void cancel() {
        firstEnd.reset();
        pressHole.reset();
        wireStart.reset();
        gesture = Gesture::None;
    }
};

/// A sensible first value for a new part of a kind ("10k" for a resistor, "100n" for a capacitor).
std::string defaultValue(const std::string& kind);

}  // namespace stripsmith

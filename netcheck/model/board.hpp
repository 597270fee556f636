// The board document: grid, copper pattern, cuts, on-board parts, links, off-board parts, wires.
#pragma once

#include <compare>
#include <optional>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "netcheck/model/circuit.hpp"
#include "netcheck/model/hole.hpp"

namespace netcheck {

/// How the copper on the underside is laid out. Strips: each row is one strip the full width.
/// Pads: every hole its own pad (plain perfboard). New patterns describe copper islands as sets of
/// holes; the tracer asks only "which neighbours share copper with this hole".
enum class CopperPattern { Strips, Pads };

/// A track cut. A hole cut removes the copper ring at `hole` (no lead may go there); a between cut
/// scores the strip between `hole` and the next hole along the strip (column + 1).
struct Cut {
    enum class Kind { Hole, Between };
    Hole hole;
    Kind kind = Kind::Hole;
    auto operator<=>(const Cut&) const = default;
};

/// "C5" for a hole cut, "D7|D8" for a between cut.
std::string cutName(const Cut& cut);

/// One lead of an on-board part and the hole it goes into.
struct Pin {
    std::string name;
    Hole hole;
    bool operator==(const Pin&) const = default;
};

/// A part on the board. Pins keep their file order. `extra` keeps drawing hints (body style,
/// rotation, pinout label ...) and unknown keys for round trips.
struct Part {
    std::string ref;
    std::string kind;
    std::string value;
    std::vector<Pin> pins;
    nlohmann::json extra = nlohmann::json::object();
    bool operator==(const Part&) const = default;
    const Pin* findPin(std::string_view name) const;
};

/// A wire link between two holes, on the component side unless `copperSide` (solder bridge or a
/// wire on the copper side).
struct Link {
    Hole from;
    Hole to;
    bool copperSide = false;
    nlohmann::json extra = nlohmann::json::object();
    /// Sleeved (or otherwise covered) wire: it may lie across leads and other links. Last, so
    /// that brace-initialised links written before it keep their meaning.
    bool insulated = false;
    bool operator==(const Link&) const = default;
};

/// "A1-C1": the link's two holes, as reports name it.
std::string linkName(const Link& link);

/// A part off the board (pot, jack, switch, DC jack, battery snap, panel LED), joined only by
/// wires.
struct OffboardPart {
    std::string ref;
    std::string kind;
    std::string value;
    std::vector<std::string> pins;  ///< lug names in order
    nlohmann::json extra = nlohmann::json::object();
    bool operator==(const OffboardPart&) const = default;
};

/// One end of a wire: a hole, or a lug `REF.PIN` of an off-board part.
struct Endpoint {
    std::optional<Hole> hole;
    PinRef lug;  ///< used when `hole` is empty
    static Endpoint atHole(Hole h) { return Endpoint{h, {}}; }
    static Endpoint atLug(PinRef p) { return Endpoint{std::nullopt, std::move(p)}; }
    bool isHole() const { return hole.has_value(); }
    /// "B3" or "VR1.2".
    std::string name() const;
    bool operator==(const Endpoint&) const = default;
};

/// A flying lead. `color` is free text in the maker's words ("red", "black", "yellow"); may be
/// empty.
struct Wire {
    Endpoint from;
    Endpoint to;
    std::string color;
    nlohmann::json extra = nlohmann::json::object();
    bool operator==(const Wire&) const = default;
};

/// The whole layout as saved in a board file.
struct Board {
    std::string title;
    int rows = 10;
    int cols = 24;
    double pitchMm = 2.54;
    CopperPattern copper = CopperPattern::Strips;
    std::vector<Cut> cuts;
    std::vector<Part> parts;
    std::vector<Link> links;
    std::vector<OffboardPart> offboard;
    std::vector<Wire> wires;
    std::optional<Circuit> circuit;
    nlohmann::json extra = nlohmann::json::object();       ///< unknown top-level keys
    nlohmann::json boardExtra = nlohmann::json::object();  ///< unknown keys of the "board" object
    bool operator==(const Board&) const = default;

    bool contains(Hole h) const { return h.row >= 0 && h.row < rows && h.col >= 0 && h.col < cols; }
    int holeCount() const { return rows * cols; }
    const Part* findPart(std::string_view ref) const;
    const OffboardPart* findOffboard(std::string_view ref) const;
    /// Board size in millimetres, measured between the outer hole centres plus one pitch.
    double widthMm() const { return cols * pitchMm; }
    double heightMm() const { return rows * pitchMm; }
};

}  // namespace netcheck

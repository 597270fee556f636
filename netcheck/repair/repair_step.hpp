// One edit of a repair plan, described by what it changes (not by list positions), so it can be
// shown, written to a report and turned into an undoable command on the board as it then is.
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "netcheck/edit/command.hpp"
#include "netcheck/model/board.hpp"

namespace netcheck {

enum class RepairAction {
    RemoveLink,   ///< a stray link
    RemoveWire,   ///< a stray wire
    TurnPart,     ///< a two-lead part the wrong way round: its leads swap holes
    ReorderPins,  ///< a three-lead part turned or rotated: its leads go back into its holes in order
    MoveCut,      ///< a cut in the wrong place
    RemoveCut,    ///< a cut that breaks a net
    MoveLead,     ///< one lead a hole off, or in a hole another lead uses
    AddCut,       ///< new material: a cut the layout lacks
    AddLink,      ///< new material: a link the layout lacks
};

/// "remove-link", "turn-part" ... as the JSON report writes them.
std::string_view repairActionId(RepairAction action);

struct RepairStep {
    RepairAction action = RepairAction::AddCut;
    std::optional<Cut> cut;      ///< the cut added or removed; for MoveCut, where it was
    std::optional<Cut> movedTo;  ///< MoveCut: where it goes
    std::optional<Link> link;    ///< the link added or removed
    std::optional<Wire> wire;    ///< the wire removed
    std::string ref;             ///< TurnPart, ReorderPins, MoveLead: the part
    std::vector<Pin> pinsBefore;  ///< that part's pins before the step ...
    std::vector<Pin> pinsAfter;   ///< ... and after it
    std::vector<int> clears;     ///< indices of the errors of the check it was planned on that it clears

    static RepairStep addCut(const Cut& cut);
    static RepairStep removeCut(const Cut& cut);
    static RepairStep moveCut(const Cut& from, const Cut& to);
    static RepairStep addLink(const Link& link);
    static RepairStep removeLink(const Link& link);
    static RepairStep removeWire(const Wire& wire);
    /// TurnPart, ReorderPins or MoveLead: the part's leads go into `after`.
    static RepairStep changePins(RepairAction action, const Part& part, std::vector<Pin> after);

    /// What to do, in a maker's words: "turn C2 round: + to G7, - to F7".
    std::string words() const;
    /// Holes the step touches, for highlighting and the JSON report.
    std::vector<Hole> holes() const;
    /// How much a careful maker would rather not do it: undoing a likely mistake is cheap, new
    /// material dearer, a long link dearer still. Used to choose between equally short plans.
    double cost() const;
    /// A key equal for equal steps (the search skips plans it has already tried).
    std::string key() const;
    /// The step as a command on `board`; null when the board no longer holds what the step
    /// changes (it was planned on another board, or has been done already).
    std::unique_ptr<edit::Command> command(const Board& board) const;
};

}  // namespace netcheck

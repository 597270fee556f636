// The checker's finders: each looks at the checked board (and the matched circuit) for one kind
// of fault and says where it is and how to mend it (private to the checker).
#pragma once

#include <vector>

#include "netcheck/check/check_report.hpp"
#include "netcheck/check/detail/checked_board.hpp"
#include "netcheck/check/detail/circuit_match.hpp"

namespace netcheck {

/// The short in `island`, which holds pins of `nets` (two or more, sorted by name): the shortest
/// copper path between pins of the first net and another, and one cut that separates those two
/// pins without splitting any net of the island.
Finding locateShort(const CheckedBoard& checked, int island, const std::vector<const Net*>& nets);

/// The board as it would be with every short's suggested cut applied: opens are mended on it, so
/// a suggested link never joins a net to a short about to be cut away.
struct RepairedBoard {
    const Board* board = nullptr;
    const Connectivity* copper = nullptr;
    const std::vector<Net>* nets = nullptr;  ///< every intended net
};

/// The open of `net`, whose pins lie in more than one island. The fix is the removal of one
/// existing cut when that alone mends the net without shorting anything (a cut in the wrong
/// place), else links through the nearest free holes.
Finding locateOpen(const CheckedBoard& checked, const Net& net, const RepairedBoard& repaired);

/// shared-hole errors, by hole.
void findSharedHoles(const CheckedBoard& checked, std::vector<Finding>& errors);
/// pin-on-cut errors, by hole.
void findLeadsOnCuts(const CheckedBoard& checked, std::vector<Finding>& errors);
/// dangling-lead warnings: an island with one lead and no link or wire end. When `onlyIslands`
/// is given, only islands flagged there are reported (with a circuit: islands holding a pin meant
/// to join another; pins the circuit leaves unconnected are don't-care).
void findDanglingLeads(const CheckedBoard& checked, const std::vector<char>* onlyIslands,
                       std::vector<Finding>& warnings);
/// trim warning: rows and columns at the edges with no pin, link end or wire end.
void findTrim(const CheckedBoard& checked, std::vector<Finding>& warnings);

/// A lead touches a bare link when their centres come this close: a 0.6 mm tinned link wire and a
/// 0.6 mm lead (typical of small parts; common practice, not a standard) meet at 0.6 mm.
inline constexpr double kLinkContactMm = 0.6;

/// Bare component-side links: link-over-lead warnings, in link order (a bare link passing over
/// holes that hold leads; holes: the link's two ends, then the holes passed over), then
/// links-touch warnings (two bare links crossing away from their ends; holes: the first link's
/// ends, then the second's). A link end lying on another link counts as a lead under that link.
void findBareLinkContacts(const CheckedBoard& checked, std::vector<Finding>& warnings);

/// Whether a new bare link would lie clear of every lead and every bare link of the board, so
/// that a suggested fix does not make a contact of its own.
bool liesClear(const CheckedBoard& checked, const Link& link);

}  // namespace netcheck

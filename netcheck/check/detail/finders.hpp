// The checker's finders: each looks at the checked board (and the matched circuit) for one kind
// of fault and says where it is (private to the checker; the repair code finds the fixes of shorts
// and opens with them).
#pragma once

#include <vector>

#include "netcheck/check/check_report.hpp"
#include "netcheck/check/checked_board.hpp"
#include "netcheck/check/circuit_match.hpp"

namespace netcheck {

/// The short in `island`, which holds pins of `nets` (two or more, sorted by name): the shortest
/// copper path between pins of the first net and another. Without `locate`, only its nets.
Finding locateShort(const CheckedBoard& checked, int island, const std::vector<const Net*>& nets,
                    bool locate);

/// The open of `net`, whose pins lie in more than one island: its pieces. Without `locate`, only
/// its net.
Finding locateOpen(const CheckedBoard& checked, const Net& net, bool locate);

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

/// Bare component-side links: link-over-lead warnings, in link order (a bare link passing over
/// holes that hold leads; holes: the link's two ends, then the holes passed over), then
/// links-touch warnings (two bare links crossing away from their ends; holes: the first link's
/// ends, then the second's). A link end lying on another link counts as a lead under that link.
void findBareLinkContacts(const CheckedBoard& checked, std::vector<Finding>& warnings);

}  // namespace netcheck

// Findings about bare wire links on the component side (private to the checker). A bare link
// lies on the board, so a lead coming up through a hole under it touches it, and two bare links
// that cross touch each other. Tracing the copper cannot see either contact: both are warnings,
// with the fix in words (sleeve the link, or route it round).
#pragma once

#include <vector>

#include "netcheck/check/detail/check_context.hpp"
#include "netcheck/check/check_report.hpp"

namespace netcheck {

/// A lead touches a bare link when their centres come this close: a 0.6 mm tinned link wire and a
/// 0.6 mm lead (typical of small parts; common practice, not a standard) meet at 0.6 mm.
inline constexpr double kLinkContactMm = 0.6;

/// link-over-lead warnings, in link order: a bare link passing over holes that hold leads (holes:
/// the link's two ends, then the holes passed over). Then links-touch warnings, in link order:
/// two bare links crossing away from their ends (holes: the first link's ends, then the second's).
/// A link end lying on another link is reported as a lead under that link, not as a crossing.
void findBareLinkContacts(const CheckContext& context, std::vector<Finding>& warnings);

/// Whether a new bare link would lie clear of every lead and every bare link of the board, so
/// that a suggested fix does not make a contact of its own.
bool liesClear(const CheckContext& context, const Link& link);

}  // namespace netcheck

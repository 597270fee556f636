// Bounds on input size, so absurd files get a clear message instead of exhausting the machine.
#pragma once

#include <cstddef>

namespace netcheck {

/// Every reader takes these; callers may relax or tighten them (tests do).
struct ReadLimits {
    int maxRows = 1000;
    int maxCols = 1000;
    std::size_t maxBytes = 64u * 1024u * 1024u;
    std::size_t maxParts = 100000;  ///< on-board plus off-board parts, and circuit parts
    int maxDepth = 64;              ///< JSON nesting
    /// JSON values in one file (each object, array, string, number, true, false and null). A
    /// value in memory takes up to ~150 bytes where its text may take two ("0,"), so the size
    /// limit alone let 60 MB of "{}," take 3 GB. 100,000 two-pin parts with 200,000 cuts and a
    /// circuit of one net per pin hold about 1.6 million.
    std::size_t maxValues = 2000000;
    /// Hole pitch in millimetres. Stripboard and perfboard exist from 1.27 mm (0.05 in) to
    /// 5.08 mm (0.2 in); the bounds leave room around those and keep the drawing and the sheet
    /// in sizes they can handle (a pitch of 1e308 mm made the board infinitely large).
    double minPitchMm = 0.5;
    double maxPitchMm = 10.0;
};

}  // namespace netcheck

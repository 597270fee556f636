// The layout engine: from the intended circuit to a complete board that the check passes.
//
// Method (a relative of gate matrix layout; Deo, Krishnamoorthy and Langston, IEEE TCAD 6(1),
// 1987): order the parts along the strips (column_order.hpp: fewest strips open at once), then
// sweep left to right placing each part in its own column(s) as its lead rule allows
// (lead_rules.hpp), nets on strips by the left-edge idea, links where a net must change strip,
// cuts where two nets meet; then improve the order by simulated annealing on the whole result:
// board area, then links, then cuts, then total link length.
#pragma once

#include <cstdint>
#include <functional>
#include <optional>
#include <string>
#include <tuple>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// How good a layout is, in the order the engine weighs it (smaller is better).
struct LayoutScore {
    int rows = 0;
    int cols = 0;
    int links = 0;
    int cuts = 0;
    int linkLength = 0;  ///< in pitches, all links together
    long area() const { return long{rows} * cols; }
    auto key() const { return std::tuple{area(), links, cuts, linkLength}; }
};

/// Progress of a layout run, for a progress bar.
struct LayoutProgress {
    long iteration = 0;
    long iterations = 0;
    LayoutScore best;
};

struct LayoutOptions {
    std::uint64_t seed = 1;
    long iterations = 3000;  ///< part orders tried after the first; bounds the work
    std::function<bool()> stop;  ///< polled between orders: ends the run with the best so far
    std::function<void(const LayoutProgress&)> progress;
    int maxRows = 0;  ///< a fixed board: at most this many strips (0: any)
    int maxCols = 0;  ///< and holes per strip (0: any)
    /// The positive supply on the top strip and 0 V on the bottom strip, each the whole length
    /// (supply_nets.hpp says which nets those are). Only for a layout from scratch.
    bool rails = false;
};

/// Bounds no layout of the circuit beats, shown beside the result.
struct LayoutBounds {
    int strips = 0;       ///< the most nets one column of a part touches; the tallest part
    int orderStrips = 0;  ///< strips the part order found needs if every net kept one strip
                          ///< (a DIP counted as one column): the density the sweep starts from
    long area = 0;        ///< holes: the parts' leads and bodies (no two share a hole), and at
                          ///< least `strips` times the widest part
};

struct LayoutResult {
    bool ok = false;
    std::string problem;  ///< why there is no layout (when !ok)
    Board board;          ///< trimmed; the circuit embedded
    LayoutScore score;
    LayoutBounds bounds;
    long iterationsUsed = 0;
};

/// Lays out `circuit`. With `placed`, its parts stay exactly where they are and the rest go to
/// their right; its cuts, links and wires are made anew. A placed part the circuit does not name
/// is refused (named in the problem), as are rails around placed parts. Deterministic for a
/// given seed and iteration count.
LayoutResult layOut(const Circuit& circuit, const LayoutOptions& options = {},
                    const Board* placed = nullptr);

}  // namespace netcheck

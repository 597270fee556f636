// Ordering the columns of a layout so that few strips are needed at once.
//
// Columns are part positions along the strips; each column touches some nets. A net's strip must
// run from the first to the last column that touches it, so an order needs as many strips as the
// largest number of nets whose span covers one column (the open-stacks objective; Linhares and
// Yanasse, Computers & Operations Research 29, 2002, show it is the gate matrix layout problem).
#pragma once

#include <cstdint>
#include <functional>
#include <vector>

namespace netcheck {

/// Which nets each column touches. Nets are numbered 0..nets-1.
struct ColumnProblem {
    int nets = 0;
    std::vector<std::vector<int>> columnNets;  ///< per column, the nets it touches
    int columns() const { return static_cast<int>(columnNets.size()); }
};

/// The number of strips `order` (a permutation of the columns) needs: the most nets open at one
/// column, a net open from its first to its last column.
int openStrips(const ColumnProblem& problem, const std::vector<int>& order);

/// A bound no order beats: the most nets one column touches.
int stripLowerBound(const ColumnProblem& problem);

/// How far the search has got, for a progress bar.
struct OrderProgress {
    long iteration = 0;
    long iterations = 0;
    int bestStrips = 0;
};

/// How long and how to search. The search is deterministic for a given seed and iteration count;
/// `stop` (polled every few hundred iterations) ends it early with the best order so far.
struct OrderOptions {
    std::uint64_t seed = 1;
    long iterations = 200000;
    std::function<bool()> stop;
    std::function<void(const OrderProgress&)> progress;
};

struct OrderResult {
    std::vector<int> order;  ///< columns, 0-based, first to last
    int strips = 0;
    long iterationsUsed = 0;
};

/// The column order with the fewest strips found: a greedy start (each next column the one that
/// opens fewest new nets and closes most), then simulated annealing over moves of one column and
/// swaps, restarted from the best order when it stalls.
OrderResult orderColumns(const ColumnProblem& problem, const OrderOptions& options = {});

}  // namespace netcheck

// The layout engine run off the frame: "Lay out from the circuit" and "Place the remaining parts"
// take seconds, and the editor must keep drawing (with a progress bar and Cancel) meanwhile. One
// run tries a few seeds in turn and keeps the distinct correct layouts as alternatives.
#pragma once

#include <atomic>
#include <mutex>
#include <optional>
#include <thread>
#include <vector>

#include "netcheck/layout/layout_engine.hpp"

namespace stripsmith {

/// What to lay out and how.
struct LayoutRequest {
    netcheck::Circuit circuit;
    std::optional<netcheck::Board> placed;  ///< "place the rest": its parts stay where they are
    netcheck::LayoutOptions options;        ///< seed of the first alternative, iterations of each
    int alternatives = 3;                   ///< runs, with seeds seed, seed + 1, ...
};

/// Where a run stands, for the dialog (copied out each frame).
struct LayoutStatus {
    bool running = false;
    bool finished = false;   ///< a run ended (not cancelled); its results are ready
    double fraction = 0;     ///< of the whole run, 0 to 1
    std::optional<netcheck::LayoutScore> best;  ///< the best so far
};

class LayoutWorker {
public:
    LayoutWorker() = default;
    ~LayoutWorker();
    LayoutWorker(const LayoutWorker&) = delete;
    LayoutWorker& operator=(const LayoutWorker&) = delete;

    /// Starts a run (cancelling one under way).
    void start(LayoutRequest request);
    /// Ends the run under way; its results are dropped.
    void cancel();
    LayoutStatus status() const;
    /// The finished run's layouts, best first, without duplicates (empty: none fitted, see
    /// problem()). Taken once.
    std::vector<netcheck::LayoutResult> takeResults();
    /// Why no layout was found, when takeResults() was empty.
    std::string problem() const;
    /// Blocks until the run ends (tests).
    void waitIdle();

private:
    void run(LayoutRequest request);
    void join();

    mutable std::mutex mutex_;
    LayoutStatus status_;
    std::vector<netcheck::LayoutResult> results_;
    std::string problem_;
    std::atomic<bool> cancel_{false};
    std::thread thread_;
};

/// Orders tried per alternative unless the maker says otherwise: STRIPSMITH_LAYOUT_ITERATIONS
/// when set (tests make runs short), else a budget of about a second per alternative on a small
/// circuit.
long defaultLayoutIterations();

}  // namespace stripsmith

// The bench voltages of the open board, worked out on a thread of their own: ngspice takes
// milliseconds to a second, and the frame must never wait for it. The editor asks after each edit
// and draws whatever result is latest (marked with the revision it belongs to).
#pragma once

#include <condition_variable>
#include <memory>
#include <mutex>
#include <optional>
#include <thread>

#include "netcheck/model/board.hpp"
#include "netcheck/voltage/bench_voltages.hpp"

namespace stripsmith {

class BenchVoltagesWorker {
public:
    /// A finished computation and the document revision it was asked for.
    struct Result {
        unsigned revision = 0;
        netcheck::BenchVoltagesResult voltages;
    };

    BenchVoltagesWorker();
    ~BenchVoltagesWorker();
    BenchVoltagesWorker(const BenchVoltagesWorker&) = delete;
    BenchVoltagesWorker& operator=(const BenchVoltagesWorker&) = delete;

    /// Asks for the voltages of (a copy of) `board`; a request not yet started is replaced, so
    /// a run of quick edits costs one computation after the last.
    void request(const netcheck::Board& board, unsigned revision);
    /// The latest finished result (null before the first); cheap, for every frame.
    std::shared_ptr<const Result> latest() const;
    /// True while a request waits or runs.
    bool busy() const;
    /// Blocks until nothing waits or runs (tests).
    void waitIdle();

private:
    void run();

    mutable std::mutex mutex_;
    std::condition_variable wake_;
    std::condition_variable idle_;
    std::optional<std::pair<netcheck::Board, unsigned>> pending_;
    std::shared_ptr<const Result> latest_;
    bool working_ = false;
    bool stopping_ = false;
    std::thread thread_;  // last: started once the members above exist
};

}  // namespace stripsmith

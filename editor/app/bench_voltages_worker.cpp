#include "editor/app/bench_voltages_worker.hpp"

namespace stripsmith {

BenchVoltagesWorker::BenchVoltagesWorker() : thread_([this] { run(); }) {}

BenchVoltagesWorker::~BenchVoltagesWorker() {
    {
        const std::lock_guard<std::mutex> lock(mutex_);
        stopping_ = true;
        pending_.reset();
    }
    wake_.notify_all();
    thread_.join();
}

void BenchVoltagesWorker::request(const netcheck::Board& board, unsigned revision) {
    {
        const std::lock_guard<std::mutex> lock(mutex_);
        pending_.emplace(board, revision);
    }
    wake_.notify_all();
}

std::shared_ptr<const BenchVoltagesWorker::Result> BenchVoltagesWorker::latest() const {
    const std::lock_guard<std::mutex> lock(mutex_);
    return latest_;
}

bool BenchVoltagesWorker::busy() const {
    const std::lock_guard<std::mutex> lock(mutex_);
    return working_ || pending_.has_value();
}

void BenchVoltagesWorker::waitIdle() {
    std::unique_lock<std::mutex> lock(mutex_);
    idle_.wait(lock, [this] { return stopping_ || (!working_ && !pending_); });
}

void BenchVoltagesWorker::run() {
    std::unique_lock<std::mutex> lock(mutex_);
    for (;;) {
        wake_.wait(lock, [this] { return stopping_ || pending_.has_value(); });
        if (stopping_) return;
        auto [board, revision] = std::move(*pending_);
        pending_.reset();
        working_ = true;
        lock.unlock();
        // Off the lock: the frame keeps reading the previous result meanwhile.
        auto result = std::make_shared<Result>(
            Result{revision, netcheck::computeBenchVoltages(board, nullptr, {})});
        lock.lock();
        latest_ = std::move(result);
        working_ = false;
        if (!pending_) idle_.notify_all();
    }
}

}  // namespace stripsmith

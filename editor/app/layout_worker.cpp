#include "editor/app/layout_worker.hpp"

#include <algorithm>
#include <cstdlib>

namespace stripsmith {

LayoutWorker::~LayoutWorker() {
    cancel_ = true;
    join();
}

void LayoutWorker::join() {
    if (thread_.joinable()) thread_.join();
}

void LayoutWorker::start(LayoutRequest request) {
    cancel_ = true;  // the engine polls this between orders, so the join below is short
    join();
    cancel_ = false;
    {
        const std::lock_guard<std::mutex> lock(mutex_);
        status_ = LayoutStatus{};
        status_.running = true;
        results_.clear();
        problem_.clear();
    }
    thread_ = std::thread([this, request = std::move(request)]() mutable { run(std::move(request)); });
}

void LayoutWorker::cancel() {
    cancel_ = true;
    join();
    const std::lock_guard<std::mutex> lock(mutex_);
    status_ = LayoutStatus{};
    results_.clear();
}

LayoutStatus LayoutWorker::status() const {
    const std::lock_guard<std::mutex> lock(mutex_);
    return status_;
}

std::vector<netcheck::LayoutResult> LayoutWorker::takeResults() {
    const std::lock_guard<std::mutex> lock(mutex_);
    status_.finished = false;
    return std::move(results_);
}

std::string LayoutWorker::problem() const {
    const std::lock_guard<std::mutex> lock(mutex_);
    return problem_;
}

void LayoutWorker::waitIdle() { join(); }

void LayoutWorker::run(LayoutRequest request) {
    const int runs = std::max(1, request.alternatives);
    const long each = std::max(1L, request.options.iterations);
    std::vector<netcheck::LayoutResult> found;
    std::string problem;
    for (int k = 0; k < runs && !cancel_; ++k) {
        netcheck::LayoutOptions options = request.options;
        options.seed = request.options.seed + static_cast<std::uint64_t>(k);
        options.stop = [this] { return cancel_.load(); };
        options.progress = [this, k, runs, each](const netcheck::LayoutProgress& p) {
            const std::lock_guard<std::mutex> lock(mutex_);
            status_.fraction =
                (static_cast<double>(k) + static_cast<double>(p.iteration) / static_cast<double>(each)) /
                runs;
            if (p.best.rows > 0 && (!status_.best || p.best.key() < status_.best->key()))
                status_.best = p.best;
        };
        netcheck::LayoutResult result =
            netcheck::layOut(request.circuit, options, request.placed ? &*request.placed : nullptr);
        if (cancel_) break;
        if (!result.ok) {
            if (problem.empty()) problem = result.problem;
            continue;
        }
        const bool seen = std::any_of(found.begin(), found.end(),
                                      [&](const auto& other) { return other.board == result.board; });
        if (!seen) found.push_back(std::move(result));
    }
    std::stable_sort(found.begin(), found.end(), [](const auto& a, const auto& b) {
        return a.score.key() < b.score.key();
    });
    const std::lock_guard<std::mutex> lock(mutex_);
    status_.running = false;
    if (cancel_) return;
    status_.finished = true;
    status_.fraction = 1;
    results_ = std::move(found);
    problem_ = results_.empty() ? problem : std::string();
}

long defaultLayoutIterations() {
    if (const char* text = std::getenv("STRIPSMITH_LAYOUT_ITERATIONS")) {
        char* end = nullptr;
        const long value = std::strtol(text, &end, 10);
        if (end != text && *end == '\0' && value > 0) return value;
    }
    return 4000;
}

}  // namespace stripsmith

// Column ordering: greedy start, then simulated annealing (Kirkpatrick, Gelatt and Vecchi,
// Science 220, 1983) with restarts from the best order found.
#include "netcheck/layout/column_order.hpp"

#include <algorithm>
#include <cmath>
#include <random>

namespace netcheck {

namespace {

// What the annealing minimises: the strips first, then the sum over columns of the nets open
// there, so that among orders with equal strips the search drifts toward shorter spans (a
// smoother landscape than the strips alone).
struct OrderCost {
    int strips = 0;
    long openSum = 0;
    long weighted(int columns) const { return long{strips} * (long{columns} * 64 + 1) + openSum; }
};

class OrderEvaluator {
public:
    explicit OrderEvaluator(const ColumnProblem& problem)
        : problem_(problem),
          first_(static_cast<std::size_t>(problem.nets)),
          last_(static_cast<std::size_t>(problem.nets)),
          delta_(static_cast<std::size_t>(problem.columns()) + 1) {}

    OrderCost cost(const std::vector<int>& order) {
        std::fill(first_.begin(), first_.end(), -1);
        for (int position = 0; position < static_cast<int>(order.size()); ++position) {
            for (int net : problem_.columnNets[static_cast<std::size_t>(order[position])]) {
                const auto n = static_cast<std::size_t>(net);
                if (first_[n] < 0) first_[n] = position;
                last_[n] = position;
            }
        }
        std::fill(delta_.begin(), delta_.end(), 0);
        for (std::size_t n = 0; n < first_.size(); ++n) {
            if (first_[n] < 0) continue;
            ++delta_[static_cast<std::size_t>(first_[n])];
            --delta_[static_cast<std::size_t>(last_[n]) + 1];
        }
        OrderCost result;
        int open = 0;
        for (std::size_t position = 0; position < order.size(); ++position) {
            open += delta_[position];
            result.strips = std::max(result.strips, open);
            result.openSum += open;
        }
        return result;
    }

private:
    const ColumnProblem& problem_;
    std::vector<int> first_;
    std::vector<int> last_;
    std::vector<int> delta_;
};

// Each next column: the one that opens the fewest nets not yet open, ties to the one that
// touches the most open nets (it brings them nearer their end).
std::vector<int> greedyOrder(const ColumnProblem& problem) {
    const int columns = problem.columns();
    std::vector<char> placed(static_cast<std::size_t>(columns), 0);
    std::vector<char> open(static_cast<std::size_t>(problem.nets), 0);
    std::vector<int> order;
    for (int step = 0; step < columns; ++step) {
        int best = -1;
        std::pair<int, int> bestScore{0, 0};
        for (int c = 0; c < columns; ++c) {
            if (placed[static_cast<std::size_t>(c)]) continue;
            int opens = 0;
            int touchesOpen = 0;
            for (int net : problem.columnNets[static_cast<std::size_t>(c)]) {
                if (open[static_cast<std::size_t>(net)]) {
                    ++touchesOpen;
                } else {
                    ++opens;
                }
            }
            const std::pair<int, int> score{opens, -touchesOpen};
            if (best < 0 || score < bestScore) {
                best = c;
                bestScore = score;
            }
        }
        placed[static_cast<std::size_t>(best)] = 1;
        for (int net : problem.columnNets[static_cast<std::size_t>(best)]) {
            open[static_cast<std::size_t>(net)] = 1;
        }
        order.push_back(best);
    }
    return order;
}

// One random move: take a column out and put it back elsewhere, or swap two columns.
void randomMove(std::vector<int>& order, std::mt19937_64& random) {
    const auto size = static_cast<int>(order.size());
    std::uniform_int_distribution<int> position(0, size - 1);
    const int a = position(random);
    int b = position(random);
    if (a == b) b = (b + 1) % size;
    if (random() % 2 == 0) {
        std::swap(order[static_cast<std::size_t>(a)], order[static_cast<std::size_t>(b)]);
        return;
    }
    const int column = order[static_cast<std::size_t>(a)];
    order.erase(order.begin() + a);
    order.insert(order.begin() + b, column);
}

}  // namespace

int openStrips(const ColumnProblem& problem, const std::vector<int>& order) {
    return OrderEvaluator(problem).cost(order).strips;
}

int stripLowerBound(const ColumnProblem& problem) {
    std::size_t most = 0;
    for (const auto& nets : problem.columnNets) most = std::max(most, nets.size());
    return static_cast<int>(most);
}

OrderResult orderColumns(const ColumnProblem& problem, const OrderOptions& options) {
    OrderResult result;
    result.order = greedyOrder(problem);
    OrderEvaluator evaluator(problem);
    const int columns = problem.columns();
    OrderCost bestCost = evaluator.cost(result.order);
    result.strips = bestCost.strips;
    if (columns < 2) return result;

    std::mt19937_64 random(options.seed);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    // A restart cools from about one strip's worth of cost to a fraction of one open net, over
    // a round whose length grows with the problem; each round starts from the best order.
    const long round = std::max(2000L, long{columns} * columns * 20);
    const double hot = static_cast<double>(columns) * 16;
    const double cold = 0.2;
    const int lowerBound = stripLowerBound(problem);
    std::vector<int> current = result.order;
    long currentCost = bestCost.weighted(columns);
    long iteration = 0;
    while (iteration < options.iterations && result.strips > lowerBound) {
        const long inRound = iteration % round;
        if (inRound == 0) {
            current = result.order;
            currentCost = bestCost.weighted(columns);
        }
        const double t = hot * std::pow(cold / hot, static_cast<double>(inRound) / round);
        std::vector<int> candidate = current;
        randomMove(candidate, random);
        const OrderCost cost = evaluator.cost(candidate);
        const long weighted = cost.weighted(columns);
        if (weighted <= currentCost ||
            unit(random) < std::exp(static_cast<double>(currentCost - weighted) / t)) {
            current = std::move(candidate);
            currentCost = weighted;
            if (weighted < bestCost.weighted(columns)) {
                bestCost = cost;
                result.order = current;
                result.strips = cost.strips;
            }
        }
        ++iteration;
        if (iteration % 256 == 0) {
            if (options.progress) options.progress({iteration, options.iterations, result.strips});
            if (options.stop && options.stop()) break;
        }
    }
    result.iterationsUsed = iteration;
    return result;
}

}  // namespace netcheck

// Disjoint sets over 0..n-1 with path halving (private to the tracer).
#pragma once

#include <numeric>
#include <vector>

namespace netcheck {

class UnionFind {
public:
    /// `count` sets of one member each.
    explicit UnionFind(int count) : parent_(static_cast<std::size_t>(count)) {
        std::iota(parent_.begin(), parent_.end(), 0);
    }

    int find(int x) {
        while (parent_[at(x)] != x) x = parent_[at(x)] = parent_[at(parent_[at(x)])];
        return x;
    }

    void unite(int a, int b) { parent_[at(find(a))] = find(b); }

private:
    static std::size_t at(int x) { return static_cast<std::size_t>(x); }
    std::vector<int> parent_;
};

}  // namespace netcheck

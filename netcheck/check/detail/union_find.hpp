// Disjoint sets over 0..n-1 with path halving; each set's root is its smallest member (private to
// the tracer, which numbers islands in order of their first segment).
#pragma once

#include <numeric>
#include <utility>
#include <vector>

namespace netcheck {

class UnionFind {
public:
    /// `count` sets of one member each.
    explicit UnionFind(int count) : parent_(static_cast<std::size_t>(count)) {
        std::iota(parent_.begin(), parent_.end(), 0);
    }

    int find(int x) {
        while (parent_[at(x)] != x) {
            parent_[at(x)] = parent_[at(parent_[at(x)])];
            x = parent_[at(x)];
        }
        return x;
    }

    void unite(int a, int b) {
        a = find(a);
        b = find(b);
        if (a == b) return;
        if (b < a) std::swap(a, b);
        parent_[at(b)] = a;
    }

private:
    static std::size_t at(int x) { return static_cast<std::size_t>(x); }
    std::vector<int> parent_;
};

}  // namespace netcheck

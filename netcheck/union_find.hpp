// Disjoint sets over 0..n-1 with path halving and union by size (private to the tracer).
#pragma once

#include <numeric>
#include <utility>
#include <vector>

namespace netcheck {

class UnionFind {
public:
    explicit UnionFind(int count) : parent_(static_cast<std::size_t>(count)),
                                    size_(static_cast<std::size_t>(count), 1) {
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
        if (size_[at(a)] < size_[at(b)]) std::swap(a, b);
        parent_[at(b)] = a;
        size_[at(a)] += size_[at(b)];
    }

private:
    static std::size_t at(int x) { return static_cast<std::size_t>(x); }
    std::vector<int> parent_;
    std::vector<int> size_;
};

}  // namespace netcheck

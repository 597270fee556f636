// One bit per hole, 64 to a word, with a count of the bits set before any hole (private to the
// checker). Facts read at random all over a large board stay in cache this way: a 1000 x 1000
// board's bits take 125 KB where a byte or an int per hole would take 1 or 4 MB.
#pragma once

#include <bit>
#include <cstdint>
#include <vector>

namespace netcheck {

class HoleBits {
public:
    /// `count` holes, every bit clear.
    void reset(int count) {
        words_.assign(static_cast<std::size_t>((count + 63) / 64), 0);
        before_.clear();
    }
    /// `count` holes, every bit set.
    void resetAllSet(int count) {
        reset(count);
        for (auto& word : words_) word = ~std::uint64_t{0};
        if (count % 64 != 0) words_.back() = (std::uint64_t{1} << (count % 64)) - 1;
    }

    void set(int hole) { words_[word(hole)] |= bit(hole); }
    bool test(int hole) const { return (words_[word(hole)] & bit(hole)) != 0; }
    void prefetch(int hole) const { __builtin_prefetch(&words_[word(hole)]); }

    /// Makes countBefore() valid until the next set(); returns the number of bits set.
    int countAll() {
        before_.resize(words_.size());
        int running = 0;
        for (std::size_t w = 0; w < words_.size(); ++w) {
            before_[w] = running;
            running += bitCount(words_[w]);
        }
        return running;
    }
    /// Bits set at holes before `hole` (after countAll()).
    int countBefore(int hole) const {
        const std::uint64_t below = bit(hole) - 1;
        return before_[word(hole)] + bitCount(words_[word(hole)] & below);
    }
    void prefetchCount(int hole) const {
        __builtin_prefetch(&words_[word(hole)]);
        __builtin_prefetch(&before_[word(hole)]);
    }

private:
    // Baseline x86-64 has no popcount instruction and std::popcount then calls into libgcc, which
    // costs more than the arithmetic it does; builds for a newer CPU use the instruction.
    static int bitCount(std::uint64_t bits) {
#if defined(__POPCNT__) || !defined(__x86_64__)
        return std::popcount(bits);
#else
        bits -= (bits >> 1) & 0x5555555555555555ull;
        bits = (bits & 0x3333333333333333ull) + ((bits >> 2) & 0x3333333333333333ull);
        bits = (bits + (bits >> 4)) & 0x0F0F0F0F0F0F0F0Full;
        return static_cast<int>((bits * 0x0101010101010101ull) >> 56);
#endif
    }
    static std::size_t word(int hole) {
        return static_cast<std::size_t>(hole) >> 6;
    }
    static std::uint64_t bit(int hole) {
        return std::uint64_t{1} << (hole & 63);
    }

    std::vector<std::uint64_t> words_;
    std::vector<int> before_;  // bits set in the words before each word
};

}  // namespace netcheck

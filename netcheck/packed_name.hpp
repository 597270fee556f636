// Short names packed into one integer, so the checker can compare a name it has just read with
// one it stored without following a pointer back to the board (private to the checker).
#pragma once

#include <cstddef>
#include <string_view>

namespace netcheck {

/// A name of up to sizeof(Word) - 1 bytes packed with its length into one integer: equal names give
/// equal numbers. Longer names give `kLong`, and must be compared in full.
template <typename Word>
struct PackedName {
    static constexpr Word kLong = ~Word{0};
    static constexpr std::size_t kMaxBytes = sizeof(Word) - 1;

    static Word of(std::string_view name) {
        if (name.size() > kMaxBytes) return kLong;
        Word packed = static_cast<Word>(name.size()) << (8 * kMaxBytes);
        for (std::size_t i = 0; i < name.size(); ++i) {
            packed |= static_cast<Word>(static_cast<unsigned char>(name[i])) << (8 * i);
        }
        return packed;
    }
};

}  // namespace netcheck

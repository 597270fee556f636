// Short names packed into one integer, so the checker can compare a name it has just read with
// one it stored without following a pointer back to the board (private to the checker).
#pragma once

#include <bit>
#include <cstddef>
#include <cstdint>
#include <cstring>
#include <string_view>

namespace netcheck {

/// A name of up to sizeof(Word) - 1 bytes packed with its length into one integer: equal names
/// give equal numbers and different names different ones. Longer names give `kLong`, and must be
/// compared in full.
template <typename Word>
struct PackedName {
    static constexpr Word kLong = ~Word{0};
    static constexpr std::size_t kMaxBytes = sizeof(Word) - 1;

    static Word of(std::string_view name) {
        const std::size_t n = name.size();
        if (n > kMaxBytes) return kLong;
        return bytes(name.data(), n) | static_cast<Word>(static_cast<Word>(n) << (8 * kMaxBytes));
    }

private:
    // Byte i of the name in bits 8i..8i+7. Two loads that overlap in the middle cover any length
    // from 2 to 8 bytes (the overlapping bytes land on the same bits), so no loop is needed.
    static_assert(std::endian::native == std::endian::little, "packing assumes little-endian");
    static Word bytes(const char* data, std::size_t n) {
        if (n >= 4) return overlapped<std::uint32_t>(data, n);
        if (n >= 2) return overlapped<std::uint16_t>(data, n);
        return n == 1 ? static_cast<Word>(static_cast<unsigned char>(data[0])) : Word{0};
    }

    template <typename Half>
    static Word overlapped(const char* data, std::size_t n) {
        Half low = 0;
        Half high = 0;
        std::memcpy(&low, data, sizeof(Half));
        std::memcpy(&high, data + n - sizeof(Half), sizeof(Half));
        return static_cast<Word>(static_cast<Word>(low) |
                                 (static_cast<Word>(high) << (8 * (n - sizeof(Half)))));
    }
};

/// A pin name packed (pin names are short: "1", "+", "VCC"), and a part value ("4k7", "100n").
using PinKey = PackedName<std::uint32_t>;
using ValueKey = PackedName<std::uint64_t>;

}  // namespace netcheck

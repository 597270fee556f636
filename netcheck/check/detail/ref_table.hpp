// Names to small integers for one check run: reference designators to part uses (private to the
// checker).
//
// Why not std::unordered_map: a check looks a ref up once per net pin, in the circuit's order,
// which jumps all over the board's parts. Here a slot is sixteen bytes and holds short names
// (seven bytes or fewer, nearly every ref) whole, so a lookup touches one slot and nothing else.
#pragma once

#include <cstdint>
#include <string_view>
#include <vector>

#include "netcheck/check/detail/packed_name.hpp"

namespace netcheck {

/// Open addressing with linear probing, at most half full. Values are non-negative.
class RefTable {
    using Packed = PackedName<std::uint64_t>;

public:
    RefTable() = default;
    explicit RefTable(std::size_t expected) { reset(expected); }

    /// Empties the table, sized for `expected` names, reusing its memory.
    void reset(std::size_t expected) {
        std::size_t size = 16;
        while (size < 2 * expected) size *= 2;
        slots_.assign(size, Slot{});
        longKeys_.clear();
        used_ = 0;
    }

    /// What a lookup of one name computes before it touches the table.
    struct Key {
        std::uint64_t packed;
        std::uint32_t hash;
    };

    static Key keyOf(std::string_view text) {
        const std::uint64_t packed = Packed::of(text);
        std::uint64_t h = 0;
        if (packed != Packed::kLong) {
            h = packed * 0x9E3779B97F4A7C15ull;  // a short name is its own hash, mixed (Fibonacci)
        } else {
            h = 14695981039346656037ull;  // FNV-1a
            for (char c : text) h = (h ^ static_cast<unsigned char>(c)) * 1099511628211ull;
        }
        return Key{packed, static_cast<std::uint32_t>(h >> 32)};
    }

    /// Asks for the slot of `key` to be brought into cache ahead of a lookup, so that a batch of
    /// lookups waits for memory once rather than once each.
    void prefetch(const Key& key) const {
        __builtin_prefetch(&slots_[key.hash & (slots_.size() - 1)]);
    }

    /// The value stored for `ref`; when absent, stores `value` and returns it. `ref` must outlive
    /// the table.
    int insert(std::string_view ref, int value) { return insert(ref, keyOf(ref), value); }
    int insert(std::string_view ref, const Key& key, int value) {
        if (2 * (used_ + 1) > slots_.size()) grow();
        Slot& slot = slots_[indexOf(ref, key)];
        if (slot.value < 0) {
            std::uint64_t packed = key.packed;
            if (packed == Packed::kLong) {
                packed = kLongTag | longKeys_.size();
                longKeys_.push_back(ref);
            }
            slot = Slot{packed, key.hash, value};
            ++used_;
        }
        return slot.value;
    }

private:
    // A slot of a long name holds this tag and the name's index in longKeys_ (a packed short name
    // has its length, at most seven, in the top byte).
    static constexpr std::uint64_t kLongTag = std::uint64_t{0xFF} << 56;
    struct Slot {
        std::uint64_t packed = 0;
        std::uint32_t hash = 0;
        std::int32_t value = -1;
    };

    bool matches(const Slot& slot, std::string_view ref, const Key& key) const {
        if (slot.hash != key.hash) return false;
        if (key.packed != Packed::kLong) return slot.packed == key.packed;
        return (slot.packed & kLongTag) == kLongTag &&
               longKeys_[static_cast<std::size_t>(slot.packed & ~kLongTag)] == ref;
    }

    // The slot holding `ref`, or the empty slot where it would go.
    std::size_t indexOf(std::string_view ref, const Key& key) const {
        const std::size_t mask = slots_.size() - 1;
        for (std::size_t i = key.hash & mask;; i = (i + 1) & mask) {
            const Slot& slot = slots_[i];
            if (slot.value < 0 || matches(slot, ref, key)) return i;
        }
    }

    void grow() {
        std::vector<Slot> old = std::move(slots_);
        slots_.assign(old.size() * 2, Slot{});
        const std::size_t mask = slots_.size() - 1;
        for (const Slot& slot : old) {
            if (slot.value < 0) continue;
            std::size_t i = slot.hash & mask;
            while (slots_[i].value >= 0) i = (i + 1) & mask;
            slots_[i] = slot;
        }
    }

    std::vector<Slot> slots_;
    std::vector<std::string_view> longKeys_;
    std::size_t used_ = 0;
};

}  // namespace netcheck

// An allocator that starts large arrays on a cache line, so elements of 64 bytes each fill exactly
// one line (private to the checker). Small arrays, in cache anyway, take the ordinary allocation:
// an aligned one costs the allocator several times as much, on every check of a small board.
#pragma once

#include <cstddef>
#include <new>

namespace netcheck {

template <typename T>
struct CacheLineAllocator {
    using value_type = T;
    static constexpr std::size_t kLine = 64;
    static constexpr std::size_t kLarge = 16 * 1024;  // bytes; smaller arrays stay in cache

    CacheLineAllocator() = default;
    template <typename U>
    CacheLineAllocator(const CacheLineAllocator<U>&) noexcept {}

    T* allocate(std::size_t n) {
        const std::size_t bytes = n * sizeof(T);
        if (bytes < kLarge) return static_cast<T*>(::operator new(bytes));
        return static_cast<T*>(::operator new(bytes, std::align_val_t{kLine}));
    }
    // Unsized deletes: some compilers leave sized deallocation off by default.
    void deallocate(T* at, std::size_t n) noexcept {
        if (n * sizeof(T) < kLarge) {
            ::operator delete(at);
        } else {
            ::operator delete(at, std::align_val_t{kLine});
        }
    }
    template <typename U>
    bool operator==(const CacheLineAllocator<U>&) const noexcept {
        return true;
    }
};

}  // namespace netcheck

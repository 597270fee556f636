// An allocator whose vectors leave new elements of trivial types unset, for arrays that are
// filled right after they are sized: on a large board, zeroing them first costs as much again.
#pragma once

#include <memory>
#include <new>
#include <utility>

namespace netcheck {

template <typename T>
struct DefaultInitAllocator : std::allocator<T> {
    template <typename U>
    struct rebind {
        using other = DefaultInitAllocator<U>;
    };

    DefaultInitAllocator() = default;
    template <typename U>
    DefaultInitAllocator(const DefaultInitAllocator<U>&) noexcept {}

    /// resize() with no value: default-initialise (leave a trivial type unset).
    template <typename U>
    void construct(U* at) {
        ::new (static_cast<void*>(at)) U;
    }
    template <typename U, typename... Args>
    void construct(U* at, Args&&... args) {
        ::new (static_cast<void*>(at)) U(std::forward<Args>(args)...);
    }
};

}  // namespace netcheck

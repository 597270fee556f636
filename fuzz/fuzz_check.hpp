// What a harness does when an input breaks a property: print why and abort, so libFuzzer saves
// the input as a crash.
#pragma once

#include <cstdio>
#include <cstdlib>
#include <string_view>

namespace fuzz {

inline void require(bool ok, std::string_view what) {
    if (ok) return;
    std::fprintf(stderr, "property broken: %.*s\n", static_cast<int>(what.size()), what.data());
    std::abort();
}

}  // namespace fuzz

// Component values: parseQuantity, sameValue and formatIec on any text. The input is split at
// the first newline into the two values compared. Properties: sameValue is reflexive and
// symmetric; a parsed magnitude is finite; formatIec takes any double.
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstring>
#include <string_view>

#include "fuzz_check.hpp"
#include "netcheck/model/value.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    const std::size_t split = text.find('\n');
    const std::string_view a = text.substr(0, split);
    const std::string_view b = split == std::string_view::npos ? a : text.substr(split + 1);

    for (std::string_view value : {a, b}) {
        if (const auto quantity = netcheck::parseQuantity(value)) {
            fuzz::require(std::isfinite(quantity->magnitude), "parsed magnitudes are finite");
            (void)netcheck::formatIec(quantity->magnitude, false);
            (void)netcheck::formatIec(quantity->magnitude, true);
        }
        fuzz::require(netcheck::sameValue(value, value), "sameValue is reflexive");
    }
    fuzz::require(netcheck::sameValue(a, b) == netcheck::sameValue(b, a), "sameValue is symmetric");

    if (size >= sizeof(double)) {
        double raw;
        std::memcpy(&raw, data, sizeof raw);
        (void)netcheck::formatIec(raw, (data[0] & 1) != 0);
    }
    return 0;
}

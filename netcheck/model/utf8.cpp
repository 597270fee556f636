// UTF-8 decoding by RFC 3629: no overlong forms, no surrogates, nothing above U+10FFFF.
#include "netcheck/model/utf8.hpp"

namespace netcheck {

CodePoint codePointAt(std::string_view text, std::size_t at) {
    const auto byte = [&](std::size_t i) {
        return i < text.size() ? static_cast<unsigned char>(text[i]) : 0u;
    };
    const unsigned lead = byte(at);
    if (lead < 0x80) return {lead, 1, true};
    const CodePoint broken{lead, 1, false};
    const std::size_t length = lead >= 0xf0 ? 4 : lead >= 0xe0 ? 3 : lead >= 0xc2 ? 2 : 0;
    if (length == 0 || lead > 0xf4) return broken;
    // The second byte's range excludes overlong forms, surrogates and values above U+10FFFF.
    const unsigned second = byte(at + 1);
    const unsigned low = lead == 0xe0 ? 0xa0 : lead == 0xf0 ? 0x90 : 0x80;
    const unsigned high = lead == 0xed ? 0x9f : lead == 0xf4 ? 0x8f : 0xbf;
    if (second < low || second > high) return broken;
    char32_t value = lead & (0x7fu >> length);
    for (std::size_t i = 1; i < length; ++i) {
        const unsigned next = byte(at + i);
        if ((next & 0xc0u) != 0x80u) return broken;
        value = (value << 6) | (next & 0x3fu);
    }
    return {value, length, true};
}

bool isControl(char32_t c) {
    return c < 0x20 || (c >= 0x7f && c <= 0x9f);
}

}  // namespace netcheck

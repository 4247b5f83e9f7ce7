package report

import (
	"strings"
	"unicode"
)

// CleanText returns s with every character that could move the cursor,
// change colours or reorder text on a terminal or in a spreadsheet replaced
// by U+FFFD: C0 and C1 control characters other than newline and tab, and
// the bidirectional formatting characters (U+061C, U+200E, U+200F,
// U+202A–U+202E, U+2066–U+2069). Invalid UTF-8 becomes U+FFFD too. Text,
// Markdown and CSV output pass through it, as do the command line's error
// messages, so a name in a calc file cannot rewrite what the reader sees.
func CleanText(s string) string {
	clean := true
	for _, r := range s {
		if unsafeRune(r) || r == unicode.ReplacementChar {
			clean = false
			break
		}
	}
	if clean {
		return s
	}
	s = strings.ToValidUTF8(s, "\uFFFD")
	return strings.Map(func(r rune) rune {
		if unsafeRune(r) {
			return unicode.ReplacementChar
		}
		return r
	}, s)
}

func unsafeRune(r rune) bool {
	switch {
	case r == '\n' || r == '\t':
		return false
	case unicode.IsControl(r):
		return true
	case r == 0x061C, r == 0x200E, r == 0x200F, r >= 0x202A && r <= 0x202E, r >= 0x2066 && r <= 0x2069:
		return true
	}
	return false
}

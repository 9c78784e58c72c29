"""URL normalisation and matching against RFC 3986's own examples and the idna library."""

import idna
import pytest

from gate import urls

def test_remove_dot_segments_rfc3986_traces():
    # RFC 3986 section 5.2.4, the two worked traces.
    assert urls.remove_dot_segments("/a/b/c/./../../g") == "/a/g"
    assert urls.remove_dot_segments("mid/content=5/../6") == "mid/6"


def test_rfc3986_section_6_2_2_example_pair_normalises_equal():
    # RFC 3986 section 6.2.2: these two are equivalent after syntax-based normalisation.
    left = urls.parse("example://a/b/c/%7Bfoo%7D")
    right = urls.parse("eXAMPLE://a/./b/../b/%63/%7bfoo%7d")
    assert str(left) == str(right) == "example://a/b/c/%7Bfoo%7D"


def test_case_normalisation_rfc3986_6_2_2_1():
    # "the URI <HTTP://www.EXAMPLE.com/> is equivalent to <http://www.example.com/>"
    assert str(urls.parse("HTTP://www.EXAMPLE.com/")) == "http://www.example.com/"
    assert str(urls.parse("http://example.com/a%3ab")) == "http://example.com/a%3Ab"


def test_unreserved_percent_decoding_rfc3986_2_3():
    # RFC 3986 2.3/2.4: octets of unreserved characters (ALPHA DIGIT - . _ ~) are decoded.
    assert str(urls.parse("http://example.com/%7Euser/%41%2D%2e%5F")) == \
        "http://example.com/~user/A-._"
    # reserved characters stay encoded: %2F is not "/"
    assert str(urls.parse("http://example.com/a%2fb")) == "http://example.com/a%2Fb"


@pytest.mark.parametrize("form", ["http://example.com", "http://example.com/",
                                  "http://example.com:/", "http://example.com:80/"])
def test_scheme_based_normalisation_rfc3986_6_2_3(form):
    # RFC 3986 6.2.3: all four are equivalent; "http://example.com/" is the normal form.
    assert str(urls.parse(form)) == "http://example.com/"


def test_empty_query_is_not_dropped_rfc3986_6_2_3():
    # RFC 3986 6.2.3: "http://example.com/?" cannot be assumed equivalent to the above.
    assert str(urls.parse("http://example.com/?")) == "http://example.com/?"


def test_semantic_attack_example_rfc3986_7_6():
    # RFC 3986 7.6: the host is 10.0.0.1, not cnn.example.com.
    parsed = urls.parse("ftp://cnn.example.com&story=breaking_news@10.0.0.1/top_story.htm")
    assert parsed.host == "10.0.0.1"
    assert parsed.userinfo == "cnn.example.com&story=breaking_news"


def test_idna_hosts_against_the_idna_library():
    # Reference: the `idna` package (IDNA 2008 with UTS 46 mapping), and the common example
    # "bücher" -> "xn--bcher-kva" (check-values.md section 7, verified with idna 3.13).
    assert urls.parse("https://bücher.example/").host == "xn--bcher-kva.example"
    assert urls.parse("https://bücher.example/").host == \
        idna.encode("bücher.example", uts46=True).decode()
    # IDNA 2008 keeps sharp s (Python's built-in IDNA 2003 codec would map it to "ss").
    assert urls.parse("https://faß.de/").host == "xn--fa-hia.de"
    # full-width dots and letters map to ASCII under UTS 46
    assert urls.parse("https://ＤＯＣＳ．example．org/").host == "docs.example.org"


def test_joiner_between_latin_letters_is_rejected_rfc5892():
    # RFC 5892 CONTEXTJ: ZWNJ between Latin letters is invalid (check-values.md section 7).
    with pytest.raises(urls.URLProblem):
        urls.parse("https://ab\u200ccd.example/")


@pytest.mark.parametrize("bad", [
    "docs.example.org/a",  # no scheme
    "https://docs.example.org/a b",  # space
    "https://docs.example.org\\@evil.test/",  # backslash
    "https://docs.example.org/%zz",  # broken escape
    "https://docs.example.org:99999/",  # port out of range
    "https:///nohost",
    " https://docs.example.org/",
    "https://exa_mple..org/",
])
def test_malformed_urls_are_rejected(bad):
    with pytest.raises(urls.URLProblem):
        urls.parse(bad)


def test_trailing_dot_and_default_port():
    assert urls.parse("https://Docs.Example.org.:443/x").host == "docs.example.org"
    assert urls.parse("https://docs.example.org:8443/x").port == 8443


@pytest.mark.parametrize("host,ok", [
    ("docs.example.org", True),
    ("a.docs.example.org", True),
    ("a.b.docs.example.org", True),
    ("docs.example.org.evil.test", False),  # the allowed name as a prefix of another
    ("docs-example.org", False),  # a look-alike, not a subdomain
    ("xdocs.example.org", False),  # string suffix, not a label boundary
    ("example.org", False),  # the parent is not covered
])
def test_host_matching_on_label_boundaries(host, ok):
    assert urls.host_matches(host, "docs.example.org", subdomains=True) is ok
    assert urls.host_matches(host, "docs.example.org", subdomains=False) is \
        (host == "docs.example.org")


@pytest.mark.parametrize("url,ok", [
    ("https://wiki.example.org/public/", True),
    ("https://wiki.example.org/public", True),
    ("https://wiki.example.org/public/a/b", True),
    ("https://WIKI.example.org:443/public/./a", True),
    ("https://wiki.example.org/publicity", False),
    ("https://wiki.example.org/public/../private/x", False),  # dot segments removed first
    ("https://wiki.example.org/public/%2e%2e/private", False),  # %2E is "." (unreserved)
    ("http://wiki.example.org/public/a", False),  # other scheme
    ("https://wiki.example.org:8443/public/a", False),  # other port
    ("https://wiki.example.org.evil.test/public/a", False),
])
def test_prefix_matching_on_segment_boundaries(url, ok):
    prefix = urls.parse("https://wiki.example.org/public/")
    assert urls.prefix_matches(urls.parse(url), prefix) is ok

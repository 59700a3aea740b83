package org.inkgate.format.archive;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class EntryNamesTest {

    @ParameterizedTest
    @ValueSource(strings = {"manifest.json", "prompts/task-1.md", "packs/wordnet-3.1.inkpack", "prompts/café.md",
            "a/b/c/d.txt", "CONSOLE.md", "com10.md"})
    void problem_plainRelativeName_isNone(String name) {
        assertNull(EntryNames.problem(name), name);
    }

    /** Names that escape the folder, or that Windows cannot store as one plain file (from Microsoft's file naming rules, from memory). */
    @ParameterizedTest
    @ValueSource(strings = {"/etc/passwd", "../x.md", "a/../../x.md", "a\\b.md", "C:x.md", "a//b.md", "a/./b.md",
            "CON", "nul.md", "prompts/COM1.md", "Lpt9.txt", "prompt.md.", "prompt.md ", "prompts/a:b.md", "a*b.md",
            "a?b.md", "a|b.md", "a<b.md", "a>b.md", "a\"b.md", "tab\there.md", "c1\u0085.md", "dir/"})
    void problem_unsafeName_isNamed(String name) {
        assertNotNull(EntryNames.problem(name), name);
    }

    @ParameterizedTest
    @ValueSource(strings = {"prompts/T1.md", "PROMPTS/t1.md", "prompts/t1.md/extra", "prompts"})
    void nameSet_nameThatIsTheSameFileOrAFolderClash_isRefused(String second) {
        EntryNames.NameSet names = new EntryNames.NameSet();
        assertNull(names.add("prompts/t1.md"));
        assertNotNull(names.add(second), second);
    }

    @ParameterizedTest
    @ValueSource(strings = {"prompts/cafe\u0301.md"})
    void nameSet_sameNameInAnotherUnicodeForm_isRefused(String decomposed) {
        EntryNames.NameSet names = new EntryNames.NameSet();
        assertNull(names.add("prompts/caf\u00e9.md"));
        assertNotNull(names.add(decomposed));
    }
}

package dev.countercheck.report;

import dev.countercheck.report.HtmlModel.ElementView;

import java.util.AbstractList;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.RandomAccess;
import java.util.function.IntFunction;

/**
 * The elements of a report as the template reads them: each view is built when it is read and kept
 * only among the last {@link Paging#PER_PART} read, so that rendering a project of many thousand
 * elements holds one part's formatted calculations and drawings at a time, not all of them. The
 * template reads the list a few times (summary table, contents, elements, calculations): a page of
 * up to one part builds each view once; the one page of a larger project (the PDF's) builds it again
 * on each reading.
 */
final class ElementViews extends AbstractList<ElementView> implements RandomAccess {

    private final int size;
    private final IntFunction<ElementView> view;
    private final Map<Integer, ElementView> recent = new LinkedHashMap<>(2 * Paging.PER_PART, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Integer, ElementView> eldest) {
            return size() > Paging.PER_PART;
        }
    };

    /** @param view the view of the element at an index (from 0) */
    ElementViews(int size, IntFunction<ElementView> view) {
        this.size = size;
        this.view = view;
    }

    @Override
    public ElementView get(int index) {
        if (index < 0 || index >= size) {
            throw new IndexOutOfBoundsException(index);
        }
        return recent.computeIfAbsent(index, view::apply);
    }

    @Override
    public int size() {
        return size;
    }
}

package dev.countercheck.report;

import dev.countercheck.report.HtmlModel.ElementView;

import java.util.AbstractList;
import java.util.RandomAccess;
import java.util.function.IntFunction;

/**
 * The elements of a report as the template reads them: each view is built when it is read and not
 * kept, so that rendering a project of many thousand elements holds one element's formatted
 * calculations and drawings at a time, not all of them. The template reads the list a few times
 * (summary table, contents, elements, calculations); each reading builds the same view again.
 */
final class ElementViews extends AbstractList<ElementView> implements RandomAccess {

    private final int size;
    private final IntFunction<ElementView> view;

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
        return view.apply(index);
    }

    @Override
    public int size() {
        return size;
    }
}

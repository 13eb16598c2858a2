package eluvia.ui.internal.editor;

import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Composite;

import eluvia.design.Cautions;
import eluvia.site.model.PriceBook;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** Price books: unit rates with their units, currencies and sources. */
final class PriceBooksPage extends MasterDetailPage<PriceBook> {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private final Color cautionColour;

    PriceBooksPage(Bindings bindings, Color cautionColour) {
        super(bindings);
        this.cautionColour = cautionColour;
    }

    @Override
    String title() {
        return Messages.Page_priceBooks;
    }

    @Override
    EObject owner() {
        return project;
    }

    @Override
    EReference list() {
        return P.getProject_PriceBooks();
    }

    @Override
    List<PriceBook> rows() {
        return project.getPriceBooks();
    }

    @Override
    void columns(ObjectTable<PriceBook> t) {
        t.text(P.getPriceBook_Name(), Messages.PriceBook_name).text(P.getPriceBook_Currency(), Messages.PriceBook_currency)
                .column(Messages.PriceBook_itemCount, b -> Integer.toString(b.getItems().size()))
                .column(Messages.PriceBook_reference, PriceBook::getReference);
    }

    @Override
    PriceBook newRow() {
        PriceBook b = SiteFactory.eINSTANCE.createPriceBook();
        b.setName(Messages.bind(Messages.PriceBook_newName, rows().size() + 1));
        return b;
    }

    @Override
    void details(Composite form, PriceBook book) {
        Bindings b = bindings;
        Forms.caution(form, Cautions.INVENTED_EXAMPLE, cautionColour, 2);
        Forms.heading(form, Messages.bind(Messages.PriceBook_heading, book.getName()), 2);
        b.text(form, book, P.getPriceBook_Name(), Messages.PriceBook_name, false);
        b.text(form, book, P.getPriceBook_Currency(), Messages.PriceBook_currency, false);
        b.text(form, book, P.getPriceBook_Reference(), Messages.PriceBook_reference, true);
        Forms.heading(form, Messages.PriceBook_markupsHeading, 2);
        Forms.note(form, Messages.PriceBook_markupsNote, 2);
        Range percent = Range.of(0, true, 100, true);
        b.number(form, book, P.getPriceBook_ScopeContingencyPercent(), NumberSpec.fixed(Messages.PriceBook_scope, "%", percent));
        b.number(form, book, P.getPriceBook_BidContingencyPercent(), NumberSpec.fixed(Messages.PriceBook_bid, "%", percent));
        b.number(form, book, P.getPriceBook_ProjectManagementPercent(),
                NumberSpec.fixed(Messages.PriceBook_projectManagement, "%", percent));
        b.number(form, book, P.getPriceBook_RemedialDesignPercent(),
                NumberSpec.fixed(Messages.PriceBook_remedialDesign, "%", percent));
        b.number(form, book, P.getPriceBook_ConstructionManagementPercent(),
                NumberSpec.fixed(Messages.PriceBook_constructionManagement, "%", percent));
        b.number(form, book, P.getPriceBook_OperatingContingencyPercent(),
                NumberSpec.fixed(Messages.PriceBook_operatingContingency, "%", percent));
        b.number(form, book, P.getPriceBook_OperatingProjectManagementPercent(),
                NumberSpec.fixed(Messages.PriceBook_operatingProjectManagement, "%", percent));
        b.number(form, book, P.getPriceBook_TechnicalSupportPercent(),
                NumberSpec.fixed(Messages.PriceBook_technicalSupport, "%", percent));
        b.number(form, book, P.getPriceBook_DiscountRatePercent(),
                NumberSpec.fixed(Messages.PriceBook_discountRate, "% per year", Range.of(-5, true, 30, true)));
        b.text(form, book, P.getPriceBook_DiscountRateBasis(), Messages.PriceBook_discountRateBasis, false);
        nestedList(form, Messages.PriceBook_itemsHeading, book, P.getPriceBook_Items(),
                () -> SiteFactory.eINSTANCE.createPriceItem(),
                t -> t.text(P.getPriceItem_Code(), Messages.PriceItem_code).text(P.getPriceItem_Name(), Messages.PriceItem_name)
                        .text(P.getPriceItem_Unit(), Messages.PriceItem_unit)
                        .number(P.getPriceItem_RatePerUnit(), NumberSpec.fixed(Messages.PriceItem_rate, Messages.PriceItem_perUnit, Range.nonNegative()))
                        .text(P.getPriceItem_Currency(), Messages.PriceItem_currency)
                        .text(P.getPriceItem_SourceNote(), Messages.PriceItem_source));
    }
}

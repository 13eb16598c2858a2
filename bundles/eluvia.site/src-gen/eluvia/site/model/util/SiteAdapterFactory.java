/**
 */
package eluvia.site.model.util;

import eluvia.site.model.*;

import org.eclipse.emf.common.notify.Adapter;
import org.eclipse.emf.common.notify.Notifier;

import org.eclipse.emf.common.notify.impl.AdapterFactoryImpl;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * The <b>Adapter Factory</b> for the model.
 * It provides an adapter <code>createXXX</code> method for each class of the model.
 * <!-- end-user-doc -->
 * @see eluvia.site.model.SitePackage
 * @generated
 */
public class SiteAdapterFactory extends AdapterFactoryImpl {
	/**
	 * The cached model package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected static SitePackage modelPackage;

	/**
	 * Creates an instance of the adapter factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SiteAdapterFactory() {
		if (modelPackage == null) {
			modelPackage = SitePackage.eINSTANCE;
		}
	}

	/**
	 * Returns whether this factory is applicable for the type of the object.
	 * <!-- begin-user-doc -->
	 * This implementation returns <code>true</code> if the object is either the model's package or is an instance object of the model.
	 * <!-- end-user-doc -->
	 * @return whether this factory is applicable for the type of the object.
	 * @generated
	 */
	@Override
	public boolean isFactoryForType(Object object) {
		if (object == modelPackage) {
			return true;
		}
		if (object instanceof EObject) {
			return ((EObject)object).eClass().getEPackage() == modelPackage;
		}
		return false;
	}

	/**
	 * The switch that delegates to the <code>createXXX</code> methods.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SiteSwitch<Adapter> modelSwitch =
		new SiteSwitch<Adapter>() {
			@Override
			public Adapter caseProject(Project object) {
				return createProjectAdapter();
			}
			@Override
			public Adapter caseSite(Site object) {
				return createSiteAdapter();
			}
			@Override
			public Adapter caseSoilLayer(SoilLayer object) {
				return createSoilLayerAdapter();
			}
			@Override
			public Adapter caseContaminant(Contaminant object) {
				return createContaminantAdapter();
			}
			@Override
			public Adapter caseCleanupLevel(CleanupLevel object) {
				return createCleanupLevelAdapter();
			}
			@Override
			public Adapter caseTreatmentZone(TreatmentZone object) {
				return createTreatmentZoneAdapter();
			}
			@Override
			public Adapter caseSourceConcentration(SourceConcentration object) {
				return createSourceConcentrationAdapter();
			}
			@Override
			public Adapter caseFlushingDesign(FlushingDesign object) {
				return createFlushingDesignAdapter();
			}
			@Override
			public Adapter caseRevision(Revision object) {
				return createRevisionAdapter();
			}
			@Override
			public Adapter caseVertex(Vertex object) {
				return createVertexAdapter();
			}
			@Override
			public Adapter caseSamplingLocation(SamplingLocation object) {
				return createSamplingLocationAdapter();
			}
			@Override
			public Adapter caseSample(Sample object) {
				return createSampleAdapter();
			}
			@Override
			public Adapter caseExcavationDesign(ExcavationDesign object) {
				return createExcavationDesignAdapter();
			}
			@Override
			public Adapter casePriceBook(PriceBook object) {
				return createPriceBookAdapter();
			}
			@Override
			public Adapter casePriceItem(PriceItem object) {
				return createPriceItemAdapter();
			}
			@Override
			public Adapter caseColumnTest(ColumnTest object) {
				return createColumnTestAdapter();
			}
			@Override
			public Adapter caseColumnTestPoint(ColumnTestPoint object) {
				return createColumnTestPointAdapter();
			}
			@Override
			public Adapter caseUncertaintySettings(UncertaintySettings object) {
				return createUncertaintySettingsAdapter();
			}
			@Override
			public Adapter caseUncertainInput(UncertainInput object) {
				return createUncertainInputAdapter();
			}
			@Override
			public Adapter caseRankCorrelation(RankCorrelation object) {
				return createRankCorrelationAdapter();
			}
			@Override
			public Adapter caseZoneAnalysisSettings(ZoneAnalysisSettings object) {
				return createZoneAnalysisSettingsAdapter();
			}
			@Override
			public Adapter defaultCase(EObject object) {
				return createEObjectAdapter();
			}
		};

	/**
	 * Creates an adapter for the <code>target</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param target the object to adapt.
	 * @return the adapter for the <code>target</code>.
	 * @generated
	 */
	@Override
	public Adapter createAdapter(Notifier target) {
		return modelSwitch.doSwitch((EObject)target);
	}


	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.Project <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.Project
	 * @generated
	 */
	public Adapter createProjectAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.Site <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.Site
	 * @generated
	 */
	public Adapter createSiteAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.SoilLayer <em>Soil Layer</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.SoilLayer
	 * @generated
	 */
	public Adapter createSoilLayerAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.Contaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.Contaminant
	 * @generated
	 */
	public Adapter createContaminantAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.CleanupLevel <em>Cleanup Level</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.CleanupLevel
	 * @generated
	 */
	public Adapter createCleanupLevelAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.TreatmentZone <em>Treatment Zone</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.TreatmentZone
	 * @generated
	 */
	public Adapter createTreatmentZoneAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.SourceConcentration <em>Source Concentration</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.SourceConcentration
	 * @generated
	 */
	public Adapter createSourceConcentrationAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.FlushingDesign <em>Flushing Design</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.FlushingDesign
	 * @generated
	 */
	public Adapter createFlushingDesignAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.Revision <em>Revision</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.Revision
	 * @generated
	 */
	public Adapter createRevisionAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.Vertex <em>Vertex</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.Vertex
	 * @generated
	 */
	public Adapter createVertexAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.SamplingLocation <em>Sampling Location</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.SamplingLocation
	 * @generated
	 */
	public Adapter createSamplingLocationAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.Sample <em>Sample</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.Sample
	 * @generated
	 */
	public Adapter createSampleAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.ExcavationDesign <em>Excavation Design</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.ExcavationDesign
	 * @generated
	 */
	public Adapter createExcavationDesignAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.PriceBook <em>Price Book</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.PriceBook
	 * @generated
	 */
	public Adapter createPriceBookAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.PriceItem <em>Price Item</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.PriceItem
	 * @generated
	 */
	public Adapter createPriceItemAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.ColumnTest <em>Column Test</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.ColumnTest
	 * @generated
	 */
	public Adapter createColumnTestAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.ColumnTestPoint <em>Column Test Point</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.ColumnTestPoint
	 * @generated
	 */
	public Adapter createColumnTestPointAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.UncertaintySettings <em>Uncertainty Settings</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.UncertaintySettings
	 * @generated
	 */
	public Adapter createUncertaintySettingsAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.UncertainInput <em>Uncertain Input</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.UncertainInput
	 * @generated
	 */
	public Adapter createUncertainInputAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.RankCorrelation <em>Rank Correlation</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.RankCorrelation
	 * @generated
	 */
	public Adapter createRankCorrelationAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link eluvia.site.model.ZoneAnalysisSettings <em>Zone Analysis Settings</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see eluvia.site.model.ZoneAnalysisSettings
	 * @generated
	 */
	public Adapter createZoneAnalysisSettingsAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for the default case.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @generated
	 */
	public Adapter createEObjectAdapter() {
		return null;
	}

} //SiteAdapterFactory

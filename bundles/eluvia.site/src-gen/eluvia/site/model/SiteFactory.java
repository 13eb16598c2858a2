/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EFactory;

/**
 * <!-- begin-user-doc -->
 * The <b>Factory</b> for the model.
 * It provides a create method for each non-abstract class of the model.
 * <!-- end-user-doc -->
 * @see eluvia.site.model.SitePackage
 * @generated
 */
public interface SiteFactory extends EFactory {
	/**
	 * The singleton instance of the factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	SiteFactory eINSTANCE = eluvia.site.model.impl.SiteFactoryImpl.init();

	/**
	 * Returns a new object of class '<em>Project</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Project</em>'.
	 * @generated
	 */
	Project createProject();

	/**
	 * Returns a new object of class '<em>Site</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Site</em>'.
	 * @generated
	 */
	Site createSite();

	/**
	 * Returns a new object of class '<em>Soil Layer</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Soil Layer</em>'.
	 * @generated
	 */
	SoilLayer createSoilLayer();

	/**
	 * Returns a new object of class '<em>Contaminant</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Contaminant</em>'.
	 * @generated
	 */
	Contaminant createContaminant();

	/**
	 * Returns a new object of class '<em>Cleanup Level</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Cleanup Level</em>'.
	 * @generated
	 */
	CleanupLevel createCleanupLevel();

	/**
	 * Returns a new object of class '<em>Treatment Zone</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Treatment Zone</em>'.
	 * @generated
	 */
	TreatmentZone createTreatmentZone();

	/**
	 * Returns a new object of class '<em>Source Concentration</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Source Concentration</em>'.
	 * @generated
	 */
	SourceConcentration createSourceConcentration();

	/**
	 * Returns a new object of class '<em>Flushing Design</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Flushing Design</em>'.
	 * @generated
	 */
	FlushingDesign createFlushingDesign();

	/**
	 * Returns a new object of class '<em>Revision</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Revision</em>'.
	 * @generated
	 */
	Revision createRevision();

	/**
	 * Returns a new object of class '<em>Vertex</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Vertex</em>'.
	 * @generated
	 */
	Vertex createVertex();

	/**
	 * Returns a new object of class '<em>Sampling Location</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Sampling Location</em>'.
	 * @generated
	 */
	SamplingLocation createSamplingLocation();

	/**
	 * Returns a new object of class '<em>Sample</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Sample</em>'.
	 * @generated
	 */
	Sample createSample();

	/**
	 * Returns a new object of class '<em>Excavation Design</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Excavation Design</em>'.
	 * @generated
	 */
	ExcavationDesign createExcavationDesign();

	/**
	 * Returns a new object of class '<em>Price Book</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Price Book</em>'.
	 * @generated
	 */
	PriceBook createPriceBook();

	/**
	 * Returns a new object of class '<em>Price Item</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Price Item</em>'.
	 * @generated
	 */
	PriceItem createPriceItem();

	/**
	 * Returns a new object of class '<em>Column Test</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Column Test</em>'.
	 * @generated
	 */
	ColumnTest createColumnTest();

	/**
	 * Returns a new object of class '<em>Column Test Point</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Column Test Point</em>'.
	 * @generated
	 */
	ColumnTestPoint createColumnTestPoint();

	/**
	 * Returns a new object of class '<em>Uncertainty Settings</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Uncertainty Settings</em>'.
	 * @generated
	 */
	UncertaintySettings createUncertaintySettings();

	/**
	 * Returns a new object of class '<em>Uncertain Input</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Uncertain Input</em>'.
	 * @generated
	 */
	UncertainInput createUncertainInput();

	/**
	 * Returns a new object of class '<em>Rank Correlation</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Rank Correlation</em>'.
	 * @generated
	 */
	RankCorrelation createRankCorrelation();

	/**
	 * Returns a new object of class '<em>Zone Analysis Settings</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Zone Analysis Settings</em>'.
	 * @generated
	 */
	ZoneAnalysisSettings createZoneAnalysisSettings();

	/**
	 * Returns the package supported by this factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the package supported by this factory.
	 * @generated
	 */
	SitePackage getSitePackage();

} //SiteFactory

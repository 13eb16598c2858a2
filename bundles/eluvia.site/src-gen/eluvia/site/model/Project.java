/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Project</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The root of a project file (.eluvia): one site, the contaminants of concern, their cleanup levels and the flushing designs compared for the site.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.Project#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getDescription <em>Description</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getSchemaVersion <em>Schema Version</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getSite <em>Site</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getContaminants <em>Contaminants</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getCleanupLevels <em>Cleanup Levels</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getFlushingDesigns <em>Flushing Designs</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getUnitSystem <em>Unit System</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getRevisions <em>Revisions</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getExcavationDesigns <em>Excavation Designs</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getPriceBooks <em>Price Books</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getColumnTests <em>Column Tests</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getUncertainty <em>Uncertainty</em>}</li>
 *   <li>{@link eluvia.site.model.Project#getZoneAnalysis <em>Zone Analysis</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getProject()
 * @model
 * @generated
 */
public interface Project extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The project's name, shown in titles and reports.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getProject_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Project#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Free text: purpose, client, status.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see eluvia.site.model.SitePackage#getProject_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Project#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The schema version of the file this project was read from or will be written as (an integer, no unit). eluvia.site.files.ProjectFiles writes the current version on save and migrates older versions on load; 0 means not yet saved.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Schema Version</em>' attribute.
	 * @see #setSchemaVersion(int)
	 * @see eluvia.site.model.SitePackage#getProject_SchemaVersion()
	 * @model
	 * @generated
	 */
	int getSchemaVersion();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Project#getSchemaVersion <em>Schema Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Schema Version</em>' attribute.
	 * @see #getSchemaVersion()
	 * @generated
	 */
	void setSchemaVersion(int value);

	/**
	 * Returns the value of the '<em><b>Site</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The site: soil layers and treatment zones.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Site</em>' containment reference.
	 * @see #setSite(Site)
	 * @see eluvia.site.model.SitePackage#getProject_Site()
	 * @model containment="true" required="true"
	 * @generated
	 */
	Site getSite();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Project#getSite <em>Site</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Site</em>' containment reference.
	 * @see #getSite()
	 * @generated
	 */
	void setSite(Site value);

	/**
	 * Returns the value of the '<em><b>Contaminants</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.Contaminant}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contaminants of concern with their properties.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contaminants</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getProject_Contaminants()
	 * @model containment="true"
	 * @generated
	 */
	EList<Contaminant> getContaminants();

	/**
	 * Returns the value of the '<em><b>Cleanup Levels</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.CleanupLevel}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The cleanup level of each contaminant.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cleanup Levels</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getProject_CleanupLevels()
	 * @model containment="true"
	 * @generated
	 */
	EList<CleanupLevel> getCleanupLevels();

	/**
	 * Returns the value of the '<em><b>Flushing Designs</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.FlushingDesign}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The in-situ flushing alternatives considered.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Flushing Designs</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getProject_FlushingDesigns()
	 * @model containment="true"
	 * @generated
	 */
	EList<FlushingDesign> getFlushingDesigns();

	/**
	 * Returns the value of the '<em><b>Unit System</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.UnitSystem}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The unit system the user prefers for display and entry. Storage is always SI.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Unit System</em>' attribute.
	 * @see eluvia.site.model.UnitSystem
	 * @see #setUnitSystem(UnitSystem)
	 * @see eluvia.site.model.SitePackage#getProject_UnitSystem()
	 * @model
	 * @generated
	 */
	UnitSystem getUnitSystem();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Project#getUnitSystem <em>Unit System</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit System</em>' attribute.
	 * @see eluvia.site.model.UnitSystem
	 * @see #getUnitSystem()
	 * @generated
	 */
	void setUnitSystem(UnitSystem value);

	/**
	 * Returns the value of the '<em><b>Revisions</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.Revision}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Revision history, oldest first: who changed the project, when and what.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Revisions</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getProject_Revisions()
	 * @model containment="true"
	 * @generated
	 */
	EList<Revision> getRevisions();

	/**
	 * Returns the value of the '<em><b>Excavation Designs</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.ExcavationDesign}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The excavation alternatives considered.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Excavation Designs</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getProject_ExcavationDesigns()
	 * @model containment="true"
	 * @generated
	 */
	EList<ExcavationDesign> getExcavationDesigns();

	/**
	 * Returns the value of the '<em><b>Price Books</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.PriceBook}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Price books: unit rates with their sources.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Price Books</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getProject_PriceBooks()
	 * @model containment="true"
	 * @generated
	 */
	EList<PriceBook> getPriceBooks();

	/**
	 * Returns the value of the '<em><b>Column Tests</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.ColumnTest}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Laboratory column tests: measured breakthrough or elution curves.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Column Tests</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getProject_ColumnTests()
	 * @model containment="true"
	 * @generated
	 */
	EList<ColumnTest> getColumnTests();

	/**
	 * Returns the value of the '<em><b>Uncertainty</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Monte Carlo uncertainty analysis of the headline figures: settings, the uncertain inputs and their rank correlations; none means no uncertain inputs.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Uncertainty</em>' containment reference.
	 * @see #setUncertainty(UncertaintySettings)
	 * @see eluvia.site.model.SitePackage#getProject_Uncertainty()
	 * @model containment="true"
	 * @generated
	 */
	UncertaintySettings getUncertainty();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Project#getUncertainty <em>Uncertainty</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Uncertainty</em>' containment reference.
	 * @see #getUncertainty()
	 * @generated
	 */
	void setUncertainty(UncertaintySettings value);

	/**
	 * Returns the value of the '<em><b>Zone Analysis</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How the zone analysis estimates the soil above the cleanup level and after which delays the enlarged zone is computed; none means the stated defaults of the pipeline.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Zone Analysis</em>' containment reference.
	 * @see #setZoneAnalysis(ZoneAnalysisSettings)
	 * @see eluvia.site.model.SitePackage#getProject_ZoneAnalysis()
	 * @model containment="true"
	 * @generated
	 */
	ZoneAnalysisSettings getZoneAnalysis();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Project#getZoneAnalysis <em>Zone Analysis</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Zone Analysis</em>' containment reference.
	 * @see #getZoneAnalysis()
	 * @generated
	 */
	void setZoneAnalysis(ZoneAnalysisSettings value);

} // Project

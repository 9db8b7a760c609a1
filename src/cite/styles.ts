/**
 * Firnline's two citation styles, written in CSL 1.0.2 (https://docs.citationstyles.org/en/stable/
 * specification.html) and run by citeproc through citation-js:
 * - short: "Jouzel et al. 2007, Science 317, doi:10.1126/science.1141038", for text reports,
 *   checklists and hovers (one line, whatever the author count);
 * - full: every author, year, title, container, volume(issue), pages, publisher and DOI link, for
 *   `firnline explain`, JSON and the export commands.
 */

const INFO = (id: string, title: string) =>
  `<info><title>${title}</title><id>${id}</id><updated>2026-12-03T00:00:00+00:00</updated></info>`;

const LINK = `<macro name="link"><choose><if variable="DOI"><text variable="DOI" prefix="doi:"/></if><else><text variable="URL"/></else></choose></macro>`;

export const SHORT_STYLE = `<?xml version="1.0" encoding="utf-8"?>
<style xmlns="http://purl.org/net/xbiblio/csl" class="in-text" version="1.0" default-locale="en-US">
  ${INFO('firnline-short', 'Firnline short reference')}
  <macro name="names"><names variable="author"><name form="short" and="text" delimiter=", " et-al-min="3" et-al-use-first="1"/><substitute><text variable="publisher"/></substitute></names></macro>
  <macro name="where">
    <choose>
      <if variable="container-title-short"><group delimiter=" "><text variable="container-title-short"/><group delimiter=" "><text term="chapter" form="short"/><text variable="chapter-number"/></group></group></if>
      <else-if variable="container-title"><group delimiter=" "><text variable="container-title"/><text variable="volume"/></group></else-if>
      <else-if type="dataset"><text variable="publisher"/></else-if>
    </choose>
  </macro>
  <macro name="year"><choose><if variable="issued"><date variable="issued"><date-part name="year"/></date></if><else><text term="no date" form="short"/></else></choose></macro>
  ${LINK}
  <citation><layout><text macro="names"/></layout></citation>
  <bibliography>
    <layout>
      <group delimiter=", ">
        <group delimiter=" "><text macro="names"/><text macro="year"/></group>
        <text macro="where"/>
        <text macro="link"/>
      </group>
    </layout>
  </bibliography>
</style>`;

export const FULL_STYLE = `<?xml version="1.0" encoding="utf-8"?>
<style xmlns="http://purl.org/net/xbiblio/csl" class="in-text" version="1.0" default-locale="en-US">
  ${INFO('firnline-full', 'Firnline full reference')}
  <macro name="names"><names variable="author"><name name-as-sort-order="all" sort-separator=", " initialize-with=". " delimiter=", " delimiter-precedes-last="never" and="symbol"/><substitute><text variable="publisher"/></substitute></names></macro>
  <macro name="year"><choose><if variable="issued"><date variable="issued" delimiter="-"><date-part name="year"/><date-part name="month" form="numeric-leading-zeros"/><date-part name="day" form="numeric-leading-zeros"/></date></if><else><text term="no date" form="short"/></else></choose></macro>
  <macro name="container">
    <choose>
      <if type="chapter"><group delimiter=" "><text term="in" text-case="capitalize-first" suffix=":"/><group delimiter=", "><text variable="container-title"/><group delimiter=" "><text term="chapter" text-case="capitalize-first"/><text variable="chapter-number"/></group><group delimiter=" "><text term="section" form="short"/><text variable="section"/></group><text variable="publisher"/><text variable="page"/></group></group></if>
      <else-if variable="container-title"><group delimiter=", "><group delimiter=" "><text variable="container-title"/><group><text variable="volume"/><text variable="issue" prefix="(" suffix=")"/></group></group><text variable="page"/><text variable="number"/></group></else-if>
      <else><group delimiter=", "><text variable="genre" text-case="capitalize-first"/><text variable="number"/><text variable="publisher"/></group></else>
    </choose>
  </macro>
  <macro name="link"><choose><if variable="DOI"><text variable="DOI" prefix="https://doi.org/"/></if><else><text variable="URL"/></else></choose></macro>
  <citation><layout><text macro="names"/></layout></citation>
  <bibliography>
    <layout>
      <group delimiter=". ">
        <group delimiter=" "><text macro="names"/><text macro="year" prefix="(" suffix=")"/></group>
        <text variable="title"/>
        <text macro="container"/>
        <text macro="link"/>
      </group>
    </layout>
  </bibliography>
</style>`;

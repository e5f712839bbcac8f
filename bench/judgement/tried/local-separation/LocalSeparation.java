/*
 * Tried and set aside (3 December 2026, eighth session): making both sides of the separation test local.
 * See bench/judgement/README.md, "Tried and set aside: both sides of the separation test local".
 *
 *   java -cp target/treeproof.jar bench/judgement/tried/local-separation/LocalSeparation.java X.csv LAB.csv NAME
 *
 * X.csv and LAB.csv come from prep_cuts.py. For every cut (linkage, k) it prints the solution's p-value (the largest
 * over its clusters, each tested against its nearest cluster) under five ways of choosing the samples tested, all
 * with leave-one-out positions on the line joining the two centroids, the two sides weighed equally and
 * Hartigan's dip test (treeproof's DipTest) read at the effective size 4mh/(m+h):
 *   CUR  the rule on main: the whole smaller cluster S and the quarter of the larger L nearest S's centroid
 *        (at least |S| of them);
 *   Bq   both sides local: c = ceil(q |L|); the c members of L nearest S's centroid and the min(|S|, c) members
 *        of S nearest L's centroid (q = 0.25, 0.35, 0.50);
 *   S50  the quarter of L (h), and of S the min(|S|, max(h, half of S)) members nearest L's centroid; L then gives
 *        at least as many as S.
 */
import java.nio.file.*; import java.util.*; import org.treeproof.data.DipTest;
public class LocalSeparation {
  static String[] VARS={"CUR","B25","B35","B50","S50"};
  public static void main(String[] a) throws Exception {
    List<double[]> X=new ArrayList<>(); for(String l:Files.readAllLines(Path.of(a[0]))){String[] f=l.split(","); double[] v=new double[f.length]; for(int j=0;j<f.length;j++) v[j]=Double.parseDouble(f[j]); X.add(v);}
    int p=X.get(0).length;
    for(String l:Files.readAllLines(Path.of(a[1]))){
      String[] f=l.split(","); String name=f[0]; int[] lab=new int[f.length-1]; for(int i=1;i<f.length;i++) lab[i-1]=Integer.parseInt(f[i]);
      Map<Integer,List<double[]>> cl=new TreeMap<>(); for(int i=0;i<lab.length;i++) if(lab[i]>0) cl.computeIfAbsent(lab[i],k->new ArrayList<>()).add(X.get(i));
      List<Integer> keys=new ArrayList<>(cl.keySet()); Map<Integer,double[]> mu=new HashMap<>(); for(int c:keys) mu.put(c,mean(cl.get(c),p));
      StringBuilder sb=new StringBuilder(String.format("%-32s %-12s",a[2],name));
      for(String var:VARS){ double worst=0;
        for(int c:keys){ int best=-1; double bd=Double.MAX_VALUE; for(int o:keys) if(o!=c){double d=dist(mu.get(c),mu.get(o)); if(d<bd){bd=d;best=o;}}
          List<double[]> A=cl.get(c),B=cl.get(best); boolean aS=A.size()<B.size()||(A.size()==B.size()&&c<best);
          List<double[]> S=aS?A:B, L=aS?B:A; double[] mS=aS?mu.get(c):mu.get(best), mL=aS?mu.get(best):mu.get(c);
          if(2*S.size()<10) continue;
          worst=Math.max(worst,test(var,S,L,mS,mL)); }
        sb.append(String.format(" %s=%.3f",var,worst)); }
      System.out.println(sb);
    }
  }
  static double test(String var,List<double[]> S,List<double[]> L,double[] mS,double[] mL){
    int nS=S.size(), nL=L.size(); List<double[]> s,l;
    if(var.equals("CUR")){ int h=Math.max(nS,(int)Math.ceil(.25*nL)); s=S; l=near(L,mS,h); }
    else if(var.equals("S50")){ int h=(int)Math.ceil(.25*nL); int g=Math.min(nS,Math.max(h,(int)Math.ceil(.5*nS))); s=near(S,mL,g); l=near(L,mS,Math.max(h,Math.min(g,nL))); }
    else { double q=Integer.parseInt(var.substring(1))/100.0; int c=(int)Math.ceil(q*nL); s=near(S,mL,Math.min(nS,c)); l=near(L,mS,c); }
    int m=s.size(), h=l.size(); int copies=(int)Math.round((double)h/m);
    double[] pr=new double[m*copies+h]; int t=0;
    for(double[] x:s){double v=loo(x,mS,nS,mL); for(int r=0;r<copies;r++) pr[t++]=v;}
    for(double[] x:l) pr[t++]=-loo(x,mL,nL,mS);
    int neff=(int)Math.round(4.0*m*h/(m+h)); return DipTest.pValue(DipTest.dip(pr),neff).pValue(); }
  static List<double[]> near(List<double[]> L,double[] c,int h){ List<double[]> sub=new ArrayList<>(L); sub.sort(Comparator.comparingDouble(v->dist(v,c))); return sub.subList(0,Math.min(h,sub.size())); }
  static double loo(double[] x,double[] own,int n,double[] oth){ double s=0,nn=0; double[] dd=new double[x.length]; for(int j=0;j<x.length;j++){ double o=(n*own[j]-x[j])/(n-1); dd[j]=o-oth[j]; nn+=dd[j]*dd[j]; } nn=Math.sqrt(nn); if(nn==0) return 0; for(int j=0;j<x.length;j++){ double o=(n*own[j]-x[j])/(n-1); s+=(x[j]-(o+oth[j])/2)*dd[j]/nn; } return s; }
  static double[] mean(List<double[]> L,int p){double[] m=new double[p]; for(double[] v:L) for(int j=0;j<p;j++) m[j]+=v[j]/L.size(); return m;}
  static double dist(double[] a,double[] b){double s=0; for(int j=0;j<a.length;j++) s+=(a[j]-b[j])*(a[j]-b[j]); return Math.sqrt(s);}
}
